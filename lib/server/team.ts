import "server-only";
import { and, asc, desc, eq, gt, isNull, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { invitations, memberships, organisations, users } from "@/db/schema";
import { can, ROLE_LABELS, type Permission, type Role } from "@/lib/roles";
import type { InviteInput } from "@/lib/validation/auth";
import type { AccessContext } from "./access";
import { AccessDenied } from "./access-denied";
import { absoluteUrl, composeMail, sendMail } from "./mail";
import { limitMemberMail } from "./mail-limits";
import { hashPassword } from "./passwords";
import { hashToken, newId, newToken } from "./tokens";

const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

/** The data layer re-checks the role itself: a caller that forgot to authorize still cannot write. */
function assertCan(access: AccessContext, permission: Permission) {
  if (!can(access.role, permission)) throw new AccessDenied(permission);
}

export type TeamResult = { ok: true } | { ok: false; field?: string; message: string };

export async function listTeam(access: AccessContext) {
  assertCan(access, "team.manage");
  const db = await getDb();
  const organisationId = access.organisation.id;
  const members = await db
    .select({ membershipId: memberships.id, userId: users.id, name: users.name, email: users.email, role: memberships.role, joinedAt: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(memberships.userId, users.id))
    .where(eq(memberships.organisationId, organisationId))
    .orderBy(asc(users.name));
  const pending = await db
    .select({ id: invitations.id, email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt, createdAt: invitations.createdAt })
    .from(invitations)
    .where(and(eq(invitations.organisationId, organisationId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date())))
    .orderBy(desc(invitations.createdAt));
  return { members, pending };
}

export async function inviteMember(access: AccessContext, input: InviteInput): Promise<TeamResult> {
  assertCan(access, "team.manage");
  const db = await getDb();
  const organisationId = access.organisation.id;
  const existing = await db
    .select({ id: memberships.id })
    .from(memberships)
    .innerJoin(users, eq(memberships.userId, users.id))
    .where(and(eq(memberships.organisationId, organisationId), eq(users.email, input.email)))
    .get();
  if (existing) return { ok: false, field: "email", message: "This person is already a member." };
  const limited = await limitMemberMail(access);
  if (limited) return { ok: false, message: limited };

  const token = newToken();
  // A new invitation to the same address replaces the old one, so only the newest link works.
  await db.transaction(async (tx) => {
    await tx
      .update(invitations)
      .set({ revokedAt: new Date() })
      .where(and(eq(invitations.organisationId, organisationId), eq(invitations.email, input.email), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)));
    await tx.insert(invitations).values({
      id: newId(),
      organisationId,
      email: input.email,
      role: input.role,
      tokenHash: hashToken(token),
      invitedByUserId: access.user.id,
      expiresAt: new Date(Date.now() + INVITATION_LIFETIME_MS),
    });
  });

  const link = absoluteUrl(`/invite/${token}`);
  const mail = composeMail({
    heading: `Join ${access.organisation.name} on Towmargin`,
    paragraphs: [
      `${access.user.name} invites you to ${access.organisation.name} as ${ROLE_LABELS[input.role].toLowerCase()}.`,
      "Open the link to accept. It works once and for seven days.",
    ],
    actionLabel: "Accept the invitation",
    actionUrl: link,
    footer: "If you did not expect this, ignore this message: nothing happens until the link is opened.",
  });
  // The subject is ours alone: names typed by whoever signed up stay in the body, where they read as a quote.
  const sent = await sendMail({ to: input.email, subject: "You are invited to a team on Towmargin", ...mail });
  if (!sent) return { ok: false, message: "The invitation is saved, but the mail could not be sent. Try again in a moment." };
  return { ok: true };
}

async function findMembership(organisationId: string, membershipId: string) {
  const db = await getDb();
  return db
    .select()
    .from(memberships)
    .where(and(eq(memberships.id, membershipId), eq(memberships.organisationId, organisationId)))
    .get();
}

/**
 * True when the row is not an owner's, or another owner of the organisation remains. Evaluated inside the
 * same UPDATE or DELETE statement, so two owners demoting or removing each other at once cannot both pass:
 * SQLite runs one statement at a time, and the second sees the first one's result.
 */
function anotherOwnerRemains(organisationId: string) {
  return sql`(${memberships.role} <> 'owner' OR (SELECT count(*) FROM ${memberships} AS others WHERE others.organisation_id = ${organisationId} AND others.role = 'owner' AND others.id <> ${memberships.id}) > 0)`;
}

export async function changeRole(access: AccessContext, membershipId: string, role: Role): Promise<TeamResult> {
  assertCan(access, "team.manage");
  const membership = await findMembership(access.organisation.id, membershipId);
  if (!membership) return { ok: false, message: "That member is not in this organisation." };
  const db = await getDb();
  const changed = await db
    .update(memberships)
    .set({ role })
    .where(and(eq(memberships.id, membershipId), eq(memberships.organisationId, access.organisation.id), role === "owner" ? undefined : anotherOwnerRemains(access.organisation.id)))
    .returning({ id: memberships.id });
  if (changed.length === 0) {
    return { ok: false, field: "role", message: "An organisation needs at least one owner. Make someone else owner first." };
  }
  return { ok: true };
}

export async function removeMember(access: AccessContext, membershipId: string): Promise<TeamResult> {
  assertCan(access, "team.manage");
  const membership = await findMembership(access.organisation.id, membershipId);
  if (!membership) return { ok: false, message: "That member is not in this organisation." };
  const db = await getDb();
  const removed = await db
    .delete(memberships)
    .where(and(eq(memberships.id, membershipId), eq(memberships.organisationId, access.organisation.id), anotherOwnerRemains(access.organisation.id)))
    .returning({ id: memberships.id });
  if (removed.length === 0) return { ok: false, message: "An organisation needs at least one owner." };
  return { ok: true };
}

export async function revokeInvitation(access: AccessContext, invitationId: string): Promise<TeamResult> {
  assertCan(access, "team.manage");
  const db = await getDb();
  const revoked = await db
    .update(invitations)
    .set({ revokedAt: new Date() })
    .where(and(eq(invitations.id, invitationId), eq(invitations.organisationId, access.organisation.id), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
    .returning({ id: invitations.id });
  return revoked.length ? { ok: true } : { ok: false, message: "That invitation is no longer open." };
}

/** An open invitation by its link token, with what the acceptance page needs to know. */
export async function findOpenInvitation(token: string) {
  const db = await getDb();
  const row = await db
    .select({ id: invitations.id, email: invitations.email, role: invitations.role, organisationId: invitations.organisationId, organisationName: organisations.name })
    .from(invitations)
    .innerJoin(organisations, eq(invitations.organisationId, organisations.id))
    .where(and(eq(invitations.tokenHash, hashToken(token)), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date())))
    .get();
  if (!row) return null;
  const account = await db.select({ id: users.id }).from(users).where(eq(users.email, row.email)).get();
  return { ...row, hasAccount: Boolean(account) };
}

/** Marks the invitation accepted, once; the conditional update makes a second use of the link fail. */
async function claimInvitation(tx: Parameters<Parameters<Awaited<ReturnType<typeof getDb>>["transaction"]>[0]>[0], invitationId: string) {
  const claimed = await tx
    .update(invitations)
    .set({ acceptedAt: new Date() })
    .where(and(eq(invitations.id, invitationId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date())))
    .returning({ id: invitations.id });
  return claimed.length === 1;
}

/** A new person accepts: their account and membership are made together. */
export async function acceptInvitationWithNewAccount(token: string, name: string, password: string) {
  const invitation = await findOpenInvitation(token);
  if (!invitation) return { ok: false as const, message: "This invitation is no longer open. Ask for a new one." };
  if (invitation.hasAccount) return { ok: false as const, message: "This address already has an account: sign in to accept." };
  const db = await getDb();
  const passwordHash = await hashPassword(password);
  const userId = newId();
  const accepted = await db.transaction(async (tx) => {
    if (!(await claimInvitation(tx, invitation.id))) return false;
    await tx.insert(users).values({ id: userId, email: invitation.email, name, passwordHash });
    await tx.insert(memberships).values({ id: newId(), userId, organisationId: invitation.organisationId, role: invitation.role });
    return true;
  });
  if (!accepted) return { ok: false as const, message: "This invitation is no longer open. Ask for a new one." };
  return { ok: true as const, userId, organisationId: invitation.organisationId };
}

/** A signed-in person accepts an invitation addressed to their own e-mail. */
export async function acceptInvitationAsUser(token: string, user: { id: string; email: string }) {
  const invitation = await findOpenInvitation(token);
  if (!invitation) return { ok: false as const, message: "This invitation is no longer open. Ask for a new one." };
  if (invitation.email !== user.email) {
    return { ok: false as const, message: `This invitation is for ${invitation.email}. Sign in with that address to accept it.` };
  }
  const db = await getDb();
  const accepted = await db.transaction(async (tx) => {
    if (!(await claimInvitation(tx, invitation.id))) return false;
    await tx
      .insert(memberships)
      .values({ id: newId(), userId: user.id, organisationId: invitation.organisationId, role: invitation.role })
      .onConflictDoUpdate({ target: [memberships.organisationId, memberships.userId], set: { role: invitation.role } });
    return true;
  });
  if (!accepted) return { ok: false as const, message: "This invitation is no longer open. Ask for a new one." };
  return { ok: true as const, organisationId: invitation.organisationId };
}
