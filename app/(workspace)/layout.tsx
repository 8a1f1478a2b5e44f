import { AppShell } from "@/components/shell/app-shell";
import { ToastProvider } from "@/components/ui";
import { requirePage } from "@/lib/server/access";
import { isMailboxEnabled } from "@/lib/server/mailbox";

// The shell only: every page and action below checks access itself (a layout does not re-run on navigation).
export default async function WorkspaceLayout({ children }: { children: React.ReactNode }) {
  const access = await requirePage();
  return (
    <ToastProvider>
      <AppShell access={access} mailbox={isMailboxEnabled()}>
        {children}
      </AppShell>
    </ToastProvider>
  );
}
