import type { Metadata } from "next";
import Link from "next/link";
import { AuthPanel } from "@/components/auth-panel";
import { ForgotPasswordForm } from "./forgot-form";

export const metadata: Metadata = { title: "Forgot password" };

export default function ForgotPasswordPage() {
  return (
    <AuthPanel
      title="Choose a new password"
      intro="Enter the address you sign in with. If it has an account, we mail it a link that works once, for one hour."
      footer={
        <Link href="/sign-in" className="text-accent underline">
          Back to sign in
        </Link>
      }
    >
      <ForgotPasswordForm />
    </AuthPanel>
  );
}
