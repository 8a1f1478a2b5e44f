import "server-only";
import { and, desc, eq, inArray, or } from "drizzle-orm";
import { getDb } from "@/db/client";
import { capturedMail, invitations, memberships, users } from "@/db/schema";
import { env } from "@/lib/env";
import { can } from "@/lib/roles";
import type { AccessContext } from "./access";
import { AccessDenied } from "./access-denied";

/** The captured-mail page exists only where the fake SMTP server is in use (demo, development, tests). */
export function isMailboxEnabled(): boolean {
  return env.DEV_MAILBOX || env.NODE_ENV === "development";
}

/**
 * Mail an owner may read here: what was sent to the members of their own organisation and to the addresses
 * it invited. Another shop's reset links and invitations stay out of sight, even on a shared demo.
 */
async function ownAddresses(access: AccessContext) {
  const db = await getDb();
  const organisationId = access.organisation.id;
  return {
    members: db.select({ email: users.email }).from(memberships).innerJoin(users, eq(memberships.userId, users.id)).where(eq(memberships.organisationId, organisationId)),
    invited: db.select({ email: invitations.email }).from(invitations).where(eq(invitations.organisationId, organisationId)),
  };
}

export async function listCapturedMail(access: AccessContext, limit = 50) {
  if (!can(access.role, "mailbox.read")) throw new AccessDenied("mailbox.read");
  const db = await getDb();
  const own = await ownAddresses(access);
  return db
    .select()
    .from(capturedMail)
    .where(or(inArray(capturedMail.envelopeTo, own.members), inArray(capturedMail.envelopeTo, own.invited)))
    .orderBy(desc(capturedMail.id))
    .limit(limit);
}

export async function getCapturedMail(access: AccessContext, id: number) {
  if (!can(access.role, "mailbox.read")) throw new AccessDenied("mailbox.read");
  const db = await getDb();
  const own = await ownAddresses(access);
  return db
    .select()
    .from(capturedMail)
    .where(and(eq(capturedMail.id, id), or(inArray(capturedMail.envelopeTo, own.members), inArray(capturedMail.envelopeTo, own.invited))))
    .get();
}
