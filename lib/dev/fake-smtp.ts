import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";
import { getDb } from "../../db/client";
import { capturedMail } from "../../db/schema";

/**
 * A local SMTP server for the demo, development and tests: it accepts every message on 127.0.0.1 and keeps
 * it in the captured_mail table, where the owner's mailbox page and the browser tests read it.
 */
export async function startFakeSmtp(port: number): Promise<{ close: () => Promise<void> }> {
  const db = await getDb();
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    size: 5 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const to = session.envelope.rcptTo.map((r) => r.address).join(", ");
          const from = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
          await db.insert(capturedMail).values({
            envelopeFrom: from,
            envelopeTo: to,
            subject: parsed.subject ?? "(no subject)",
            text: parsed.text ?? "",
            html: typeof parsed.html === "string" ? parsed.html : null,
          });
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => resolve());
  });
  return { close: () => new Promise((resolve) => server.close(() => resolve())) };
}
