import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/lib/env";

let transporter: Transporter | undefined;

function getTransporter(): Transporter {
  transporter ??= nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE,
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD ?? "" } : undefined,
    // The local fake server speaks plain SMTP; a real relay negotiates STARTTLS on its own.
    ignoreTLS: env.SMTP_HOST === "127.0.0.1" || env.SMTP_HOST === "localhost",
    connectionTimeout: 10_000,
  });
  return transporter;
}

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** Sends one message with a plain-text and an HTML part. Returns false (and logs) when the relay refuses. */
export async function sendMail(mail: OutgoingMail): Promise<boolean> {
  try {
    await getTransporter().sendMail({ from: env.MAIL_FROM, ...mail });
    return true;
  } catch (error) {
    console.error("mail: could not send", { subject: mail.subject, reason: (error as Error).message });
    return false;
  }
}

/**
 * Hands the message to the relay without waiting for it: for answers that must not take longer when a mail
 * goes out (a reset asked for a known address answers as fast as one for an unknown address). Failures are
 * logged by sendMail.
 */
export function sendMailInBackground(mail: OutgoingMail): void {
  setImmediate(() => void sendMail(mail));
}

export function absoluteUrl(path: string): string {
  return new URL(path, env.APP_URL).toString();
}

const escapeHtml = (value: string) =>
  value.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

/** A plain, accessible message body: a greeting, some paragraphs, one button-like link, a footer. */
export function composeMail(input: { heading: string; paragraphs: string[]; actionLabel: string; actionUrl: string; footer: string }) {
  const text = [input.heading, "", ...input.paragraphs.flatMap((p) => [p, ""]), `${input.actionLabel}: ${input.actionUrl}`, "", input.footer].join("\n");
  const html = `<!doctype html><html><body style="margin:0;background:#f6f4ef;font-family:system-ui,sans-serif;color:#1c1d1f">
<div style="max-width:560px;margin:0 auto;padding:24px">
<p style="font-weight:700;letter-spacing:.02em;color:#0b6470;margin:0 0 16px">Towmargin</p>
<h1 style="font-size:20px;margin:0 0 12px">${escapeHtml(input.heading)}</h1>
${input.paragraphs.map((p) => `<p style="line-height:1.5;margin:0 0 12px">${escapeHtml(p)}</p>`).join("\n")}
<p style="margin:20px 0"><a href="${escapeHtml(input.actionUrl)}" style="background:#0b6470;color:#fff;padding:10px 16px;border-radius:6px;text-decoration:none;display:inline-block">${escapeHtml(input.actionLabel)}</a></p>
<p style="font-size:13px;color:#4b4e53;line-height:1.5">If the button does not work, paste this address into your browser:<br>${escapeHtml(input.actionUrl)}</p>
<p style="font-size:13px;color:#4b4e53;border-top:1px solid #d9d4c9;padding-top:12px;margin-top:24px">${escapeHtml(input.footer)}</p>
</div></body></html>`;
  return { text, html };
}
