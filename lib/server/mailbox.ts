import "server-only";
import { desc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { capturedMail } from "@/db/schema";
import { env } from "@/lib/env";
import { can } from "@/lib/roles";
import type { AccessContext } from "./access";
import { AccessDenied } from "./team";

/** The captured-mail page exists only where the fake SMTP server is in use (demo, development, tests). */
export function isMailboxEnabled(): boolean {
  return env.DEV_MAILBOX || env.NODE_ENV === "development";
}

export async function listCapturedMail(access: AccessContext, limit = 50) {
  if (!can(access.role, "mailbox.read")) throw new AccessDenied("mailbox.read");
  const db = await getDb();
  return db.select().from(capturedMail).orderBy(desc(capturedMail.id)).limit(limit);
}

export async function getCapturedMail(access: AccessContext, id: number) {
  if (!can(access.role, "mailbox.read")) throw new AccessDenied("mailbox.read");
  const db = await getDb();
  return db.select().from(capturedMail).where(eq(capturedMail.id, id)).get();
}
