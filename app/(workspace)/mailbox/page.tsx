import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Card, EmptyRow, PageHeader, TBody, TD, TH, THead, TR, Table } from "@/components/ui";
import { requirePage } from "@/lib/server/access";
import { isMailboxEnabled, listCapturedMail } from "@/lib/server/mailbox";

export const metadata: Metadata = { title: "Mailbox" };
export const dynamic = "force-dynamic";

const timeFormat = new Intl.DateTimeFormat("en", { dateStyle: "medium", timeStyle: "short" });

export default async function MailboxPage() {
  if (!isMailboxEnabled()) notFound();
  const access = await requirePage("mailbox.read", "/mailbox");
  const messages = await listCapturedMail(access);
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow="Demo and development only"
        title="Mailbox"
        description="What the local mail server caught for your organisation's members and the people it invited, newest first. Nothing here left this machine. In production this page does not exist."
      />
      <Card>
        <Table caption="Captured mail" hideCaption>
          <THead>
            <TR>
              <TH>To</TH>
              <TH>Subject</TH>
              <TH>Received</TH>
            </TR>
          </THead>
          <TBody>
            {messages.length === 0 ? <EmptyRow colSpan={3}>No mail yet. Invitations and password links will appear here.</EmptyRow> : null}
            {messages.map((message) => (
              <TR key={message.id}>
                <TD>{message.envelopeTo}</TD>
                <TD>
                  <Link href={`/mailbox/${message.id}`} className="text-accent underline">
                    {message.subject}
                  </Link>
                </TD>
                <TD className="whitespace-nowrap text-ink-soft">{timeFormat.format(message.receivedAt)}</TD>
              </TR>
            ))}
          </TBody>
        </Table>
      </Card>
    </div>
  );
}
