import type { Metadata } from "next";
import { AuthPanel } from "@/components/auth-panel";
import { TokenButtonForm } from "@/components/forms/token-button-form";
import { finishSignup } from "../../actions";

export const metadata: Metadata = { title: "Finish signing up", robots: { index: false } };

// A button, not a GET that acts: mail scanners open links, and must not create accounts.
export default async function ConfirmSignupPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  return (
    <AuthPanel title="One step left" intro="Your address is confirmed by this link. Press the button to create your organisation and sign in.">
      <TokenButtonForm token={token} label="Finish signing up" action={finishSignup} />
    </AuthPanel>
  );
}
