import type { Metadata } from "next";
import { Card, CardBody, PageHeader } from "@/components/ui";
import { requirePage } from "@/lib/server/access";
import { ChangePasswordForm } from "./password-form";

export const metadata: Metadata = { title: "Your account" };

export default async function AccountPage() {
  const access = await requirePage(undefined, "/account");
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Your account" description={`Signed in as ${access.user.email}.`} />
      <Card>
        <CardBody className="p-5 sm:p-6">
          <h2 className="mb-4 text-lg font-semibold text-ink">Password</h2>
          <ChangePasswordForm />
        </CardBody>
      </Card>
    </div>
  );
}
