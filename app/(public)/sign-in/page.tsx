import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthPanel } from "@/components/auth-panel";
import { getAccess } from "@/lib/server/access";
import { safeReturnPath } from "@/lib/validation/auth";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const next = typeof params.next === "string" ? params.next : undefined;
  if (await getAccess()) redirect(safeReturnPath(next));
  const notice =
    params.reset !== undefined
      ? "Your new password is set. Sign in with it."
      : params["signed-out"] !== undefined
        ? "You are signed out."
        : undefined;
  return (
    <AuthPanel
      title="Sign in"
      intro="For hitch shops, fleets and trainers. Customers open their result links without an account."
      footer={
        <>
          New to Towmargin?{" "}
          <Link href="/sign-up" className="text-accent underline">
            Set up your shop or fleet
          </Link>
        </>
      }
    >
      <SignInForm next={next ? safeReturnPath(next) : undefined} notice={notice} />
    </AuthPanel>
  );
}
