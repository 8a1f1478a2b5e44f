import type { Metadata } from "next";
import Link from "next/link";
import { AuthPanel } from "@/components/auth-panel";
import { isSignupUsable } from "@/lib/server/accounts";
import { ConfirmSignupForm } from "./confirm-form";

export const metadata: Metadata = { title: "Finish signing up", robots: { index: false } };

// A form, not a GET that acts: mail scanners open links, and must not create accounts. The password is
// chosen here, so only someone who reads this address's mail can set it.
export default async function ConfirmSignupPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  if (!(await isSignupUsable(token))) {
    return (
      <AuthPanel title="This link no longer works" intro="Sign-up links work once and for 24 hours.">
        <p className="text-sm">
          <Link href="/sign-in" className="text-accent underline">
            Sign in
          </Link>{" "}
          or{" "}
          <Link href="/sign-up" className="text-accent underline">
            sign up again
          </Link>
          .
        </p>
      </AuthPanel>
    );
  }
  return (
    <AuthPanel title="One step left" intro="Your address is confirmed by this link. Choose your password to create your organisation and sign in.">
      <ConfirmSignupForm token={token} />
    </AuthPanel>
  );
}
