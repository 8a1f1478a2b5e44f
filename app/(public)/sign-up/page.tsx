import type { Metadata } from "next";
import Link from "next/link";
import { AuthPanel } from "@/components/auth-panel";
import { SignUpForm } from "./sign-up-form";

export const metadata: Metadata = { title: "Sign up" };

export default function SignUpPage() {
  return (
    <AuthPanel
      title="Set up your shop or fleet"
      intro="You become the owner and can invite your counter staff, fleet managers and trainers."
      footer={
        <>
          Already have an account?{" "}
          <Link href="/sign-in" className="text-accent underline">
            Sign in
          </Link>
        </>
      }
    >
      <SignUpForm />
    </AuthPanel>
  );
}
