import { LogOut, UserRound } from "lucide-react";
import Link from "next/link";
import { BrandLink } from "@/components/brand";
import { Button, Select } from "@/components/ui";
import { navigationFor } from "@/lib/navigation";
import { ROLE_LABELS } from "@/lib/roles";
import type { AccessContext } from "@/lib/server/access";
import { signOut, switchTo } from "@/app/(workspace)/actions";
import { NavLinks } from "./nav-links";

export function AppShell({ access, mailbox, children }: { access: AccessContext; mailbox: boolean; children: React.ReactNode }) {
  const items = navigationFor(access.role, { mailbox });
  return (
    <div className="group/shell flex min-h-dvh flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50 focus:rounded-md focus:bg-panel focus:px-3 focus:py-2">
        Skip to content
      </a>
      <header className="no-print border-b border-rule bg-panel">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-2 sm:px-6 xl:group-has-[[data-wide-page]]/shell:max-w-[84rem]">
          <BrandLink href="/overview" className="mr-2" />
          <nav aria-label="Sections" className="order-last -mx-1 w-full sm:order-none sm:mx-0 sm:w-auto">
            <NavLinks items={items} />
          </nav>
          <div className="ml-auto flex min-w-0 items-center gap-3">
            <div className="hidden text-right text-sm leading-tight sm:block">
              <Link href="/account" className="font-medium text-ink underline-offset-2 hover:underline">
                {access.user.name}
              </Link>
              <div className="text-ink-soft" data-testid="current-role">
                {ROLE_LABELS[access.role]} · {access.organisation.name}
              </div>
            </div>
            <Link href="/account" aria-label="Your account" className="rounded-md p-2 text-ink-soft hover:text-ink sm:hidden">
              <UserRound aria-hidden="true" className="size-4" />
            </Link>
            <form action={signOut}>
              <Button type="submit" variant="quiet" size="sm" aria-label="Sign out">
                <LogOut aria-hidden="true" className="size-4" />
                <span className="hidden sm:inline">Sign out</span>
              </Button>
            </form>
          </div>
        </div>
        <div className="border-t border-rule bg-sunken/60 px-4 py-1.5 text-xs text-ink-soft sm:hidden">
          {access.user.name} · {ROLE_LABELS[access.role]} · {access.organisation.name}
        </div>
        {access.memberships.length > 1 ? (
          <div className="border-t border-rule bg-sunken/60">
            <form action={switchTo} className="mx-auto flex max-w-6xl items-center gap-2 px-4 py-1.5 sm:px-6">
              <label htmlFor="organisation-switch" className="text-xs font-medium text-ink-soft">
                Working in
              </label>
              <Select id="organisation-switch" name="organisationId" defaultValue={access.organisation.id} wrapperClassName="w-64" className="h-9 text-sm">
                {access.memberships.map((m) => (
                  <option key={m.organisationId} value={m.organisationId}>
                    {m.organisationName} ({ROLE_LABELS[m.role]})
                  </option>
                ))}
              </Select>
              <Button type="submit" size="sm" variant="secondary">
                Switch
              </Button>
            </form>
          </div>
        ) : null}
      </header>
      {/* A page that needs the room (the check screen, marked data-wide-page) widens the frame on a large screen. */}
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-6 sm:px-6 sm:py-8 xl:group-has-[[data-wide-page]]/shell:max-w-[84rem] print:max-w-none print:p-0">
        {children}
      </main>
    </div>
  );
}
