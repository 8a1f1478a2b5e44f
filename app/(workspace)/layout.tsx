import { AppShell } from "@/components/shell/app-shell";
import { ToastProvider } from "@/components/ui";
import { getAccess } from "@/lib/server/access";
import { isMailboxEnabled } from "@/lib/server/mailbox";

// The shell only: every page and action below checks access itself (a layout does not re-run on navigation).
export default async function WorkspaceLayout({ children }: { children: React.ReactNode }) {
  const access = await getAccess();
  // Signed out: the page itself sends the visitor to sign-in, with the way back.
  if (!access) return children;
  return (
    <ToastProvider>
      <AppShell access={access} mailbox={isMailboxEnabled()}>
        {children}
      </AppShell>
    </ToastProvider>
  );
}
