import type { Metadata } from "next";
import Link from "next/link";
import { AuthPanel } from "@/components/auth-panel";
import { buttonClasses } from "@/components/ui";
import { ROLE_DESCRIPTIONS, ROLE_LABELS } from "@/lib/roles";
import { getCurrentSession } from "@/lib/server/session";
import { findOpenInvitation } from "@/lib/server/team";
import { TokenButtonForm } from "@/components/forms/token-button-form";
import { acceptAsSignedIn } from "./actions";
import { NewMemberForm } from "./invite-forms";

export const metadata: Metadata = { title: "Invitation", robots: { index: false } };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = await findOpenInvitation(token);
  if (!invitation) {
    return (
      <AuthPanel title="This invitation is no longer open" intro="It was used, withdrawn, or is more than seven days old. Ask the owner for a new one." />
    );
  }
  const { user } = await getCurrentSession();
  const title = `Join ${invitation.organisationName}`;
  const intro = (
    <>
      You are invited as <strong className="text-ink">{ROLE_LABELS[invitation.role].toLowerCase()}</strong>: {ROLE_DESCRIPTIONS[invitation.role]}
    </>
  );

  if (user && user.email === invitation.email) {
    return (
      <AuthPanel title={title} intro={intro}>
        <TokenButtonForm token={token} label="Accept and join" action={acceptAsSignedIn} />
      </AuthPanel>
    );
  }
  if (user) {
    return (
      <AuthPanel title={title} intro={intro}>
        <p className="text-sm text-ink-soft">
          This invitation is for <strong className="text-ink">{invitation.email}</strong>, but you are signed in as {user.email}. Sign out, then open the link again.
        </p>
      </AuthPanel>
    );
  }
  if (invitation.hasAccount) {
    return (
      <AuthPanel title={title} intro={intro}>
        <p className="text-sm text-ink-soft">{invitation.email} already has a Towmargin account. Sign in with it to accept.</p>
        <Link href={`/sign-in?next=${encodeURIComponent(`/invite/${token}`)}`} className={buttonClasses({ className: "w-full" })}>
          Sign in to accept
        </Link>
      </AuthPanel>
    );
  }
  return (
    <AuthPanel title={title} intro={intro}>
      <NewMemberForm token={token} email={invitation.email} />
    </AuthPanel>
  );
}
