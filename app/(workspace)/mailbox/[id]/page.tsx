import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { LinkifiedText } from "@/components/linkified-text";
import { Card, CardBody, CardHeader, PageHeader } from "@/components/ui";
import { requirePage } from "@/lib/server/access";
import { getCapturedMail, isMailboxEnabled } from "@/lib/server/mailbox";

export const metadata: Metadata = { title: "Message" };

export default async function MessagePage({ params }: { params: Promise<{ id: string }> }) {
  if (!isMailboxEnabled()) notFound();
  const access = await requirePage("mailbox.read");
  const id = Number((await params).id);
  if (!Number.isSafeInteger(id) || id < 1) notFound();
  const message = await getCapturedMail(access, id);
  if (!message) notFound();
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={
          <Link href="/mailbox" className="underline">
            Mailbox
          </Link>
        }
        title={message.subject}
        description={`From ${message.envelopeFrom} to ${message.envelopeTo}`}
      />
      <Card>
        <CardHeader title="Text part" />
        <CardBody>
          <LinkifiedText text={message.text} />
        </CardBody>
      </Card>
      {message.html ? (
        <Card>
          <CardHeader title="HTML part" description="Shown in a sandbox: no scripts, no links followed." />
          <CardBody>
            <iframe title="HTML part of the message" sandbox="" srcDoc={message.html} className="h-[28rem] w-full rounded-md border border-rule bg-white" />
          </CardBody>
        </Card>
      ) : null}
    </div>
  );
}
