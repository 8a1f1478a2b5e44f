import type { Metadata } from "next";
import Link from "next/link";
import { AuthPanel } from "@/components/auth-panel";
import { isPasswordResetUsable } from "@/lib/server/accounts";
import { ResetPasswordForm } from "./reset-form";

export const metadata: Metadata = { title: "New password", robots: { index: false } };

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  if (!(await isPasswordResetUsable(token))) {
    return (
      <AuthPanel title="This link no longer works" intro="Reset links work once and for one hour.">
        <Link href="/forgot-password" className="text-accent underline">
          Ask for a new link
        </Link>
      </AuthPanel>
    );
  }
  return (
    <AuthPanel title="Choose a new password" intro="Setting it signs you out on every device.">
      <ResetPasswordForm token={token} />
    </AuthPanel>
  );
}
