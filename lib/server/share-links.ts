import "server-only";
import { and, desc, eq, gt, isNull, or } from "drizzle-orm";
import { getDb } from "@/db/client";
import { installationLinks, installationRecords, organisations, savedChecks, shareLinks } from "@/db/schema";
import { can } from "@/lib/roles";
import type { RigInput } from "@/lib/towing/input";
import type { RigResult } from "@/lib/towing/types";
import type { AccessContext } from "./access";
import { absoluteUrl, composeMail, sendMail } from "./mail";
import { limitMemberMail } from "./mail-limits";
import { linkLifetimeDays } from "./organisation";
import { AccessDenied } from "./access-denied";
import { hashToken, newId, newShareToken } from "./tokens";

export function shareUrl(token: string): string {
  return absoluteUrl(`/r/${token}`);
}

async function checkBelongs(access: AccessContext, checkId: string) {
  const db = await getDb();
  return db
    .select({ id: savedChecks.id, customerName: savedChecks.customerName })
    .from(savedChecks)
    .where(and(eq(savedChecks.id, checkId), eq(savedChecks.organisationId, access.organisation.id)))
    .get();
}

/**
 * Makes a link for one saved check. The token (192 random bits) is returned once, to show and mail; only its
 * hash is stored, so a lost link cannot be read back, only replaced. Every link ends: after the days chosen,
 * or the organisation's usual lifetime (180 days unless the owner set another in the settings).
 */
export async function createShareLink(access: AccessContext, checkId: string, expiresInDays?: number) {
  if (!can(access.role, "checks.save")) throw new AccessDenied("checks.save");
  if (!(await checkBelongs(access, checkId))) return null;
  const token = newShareToken();
  const days = expiresInDays ?? (await linkLifetimeDays(access));
  const expiresAt = new Date(Date.now() + days * 86_400_000);
  const db = await getDb();
  const id = newId();
  await db.insert(shareLinks).values({
    id,
    organisationId: access.organisation.id,
    savedCheckId: checkId,
    tokenHash: hashToken(token),
    tokenHint: token.slice(-4),
    createdByUserId: access.user.id,
    expiresAt,
  });
  return { id, token, url: shareUrl(token), expiresAt };
}

export async function listShareLinks(access: AccessContext, checkId: string) {
  if (!can(access.role, "checks.run")) throw new AccessDenied("checks.run");
  const db = await getDb();
  return db
    .select({
      id: shareLinks.id,
      tokenHint: shareLinks.tokenHint,
      createdAt: shareLinks.createdAt,
      expiresAt: shareLinks.expiresAt,
      revokedAt: shareLinks.revokedAt,
      lastOpenedAt: shareLinks.lastOpenedAt,
    })
    .from(shareLinks)
    .where(and(eq(shareLinks.savedCheckId, checkId), eq(shareLinks.organisationId, access.organisation.id)))
    .orderBy(desc(shareLinks.createdAt));
}

export async function revokeShareLink(access: AccessContext, linkId: string): Promise<boolean> {
  if (!can(access.role, "checks.save")) throw new AccessDenied("checks.save");
  const db = await getDb();
  const revoked = await db
    .update(shareLinks)
    .set({ revokedAt: new Date() })
    .where(and(eq(shareLinks.id, linkId), eq(shareLinks.organisationId, access.organisation.id), isNull(shareLinks.revokedAt)))
    .returning({ id: shareLinks.id });
  return revoked.length === 1;
}

/**
 * Mails a link the caller holds (just created) to the customer, after checking it still opens this check
 * (not withdrawn, not expired) and that the member and the organisation are within their hourly mail limit.
 */
export async function emailShareLink(access: AccessContext, checkId: string, token: string, email: string) {
  if (!can(access.role, "checks.save")) throw new AccessDenied("checks.save");
  const db = await getDb();
  const link = await db
    .select({ id: shareLinks.id })
    .from(shareLinks)
    .where(
      and(
        eq(shareLinks.tokenHash, hashToken(token)),
        eq(shareLinks.savedCheckId, checkId),
        eq(shareLinks.organisationId, access.organisation.id),
        isNull(shareLinks.revokedAt),
        or(isNull(shareLinks.expiresAt), gt(shareLinks.expiresAt, new Date())),
      ),
    )
    .get();
  if (!link) return { ok: false as const, message: "That link is not open any more. Make a new one." };
  const limited = await limitMemberMail(access);
  if (limited) return { ok: false as const, message: limited };
  const check = await checkBelongs(access, checkId);
  const url = shareUrl(token);
  const mail = composeMail({
    heading: `Your towing check from ${access.organisation.name}`,
    paragraphs: [
      check?.customerName ? `Hello ${check.customerName}.` : "Hello.",
      `${access.organisation.name} checked your vehicle, hitch and load with Towmargin. The link shows the result, every rating it was checked against, and what to watch for.`,
      "Ratings come from the vehicle maker and the labels; the lowest one governs. Weigh the loaded rig, follow each maker's instructions and torque values; Towmargin does the arithmetic and does not decide what the law allows: local law and a qualified installer have the last word.",
    ],
    actionLabel: "See the result",
    actionUrl: url,
    footer: `Sent by ${access.organisation.name} through Towmargin. The link needs no account.`,
  });
  // The shop's name (typed by whoever signed up) stays out of the subject: a fixed subject cannot be made
  // into someone else's message.
  const sent = await sendMail({ to: email, subject: "Your towing check result from Towmargin", ...mail });
  return sent ? { ok: true as const } : { ok: false as const, message: "The mail could not be sent just now. Try again in a moment." };
}

export type ResolvedShare =
  | { status: "ok"; shopName: string; createdAt: Date; customerName: string | null; rig: RigInput; result: RigResult }
  | { status: "gone"; reason: "revoked" | "expired" | "not-found" };

/**
 * What a customer's link opens, with no session at all: the snapshot and the shop's name, nothing else of
 * the shop. A revoked, expired or unknown token opens nothing.
 */
export async function resolveShareToken(token: string): Promise<ResolvedShare> {
  if (!/^[A-Za-z0-9_-]{20,100}$/.test(token)) return { status: "gone", reason: "not-found" };
  const db = await getDb();
  const row = await db
    .select({
      linkId: shareLinks.id,
      expiresAt: shareLinks.expiresAt,
      revokedAt: shareLinks.revokedAt,
      shopName: organisations.name,
      createdAt: savedChecks.createdAt,
      customerName: savedChecks.customerName,
      rig: savedChecks.rig,
      result: savedChecks.result,
    })
    .from(shareLinks)
    .innerJoin(savedChecks, eq(shareLinks.savedCheckId, savedChecks.id))
    .innerJoin(organisations, eq(shareLinks.organisationId, organisations.id))
    .where(eq(shareLinks.tokenHash, hashToken(token)))
    .get();
  if (!row) return { status: "gone", reason: "not-found" };
  if (row.revokedAt) return { status: "gone", reason: "revoked" };
  if (row.expiresAt && row.expiresAt.getTime() <= Date.now()) return { status: "gone", reason: "expired" };
  await db.update(shareLinks).set({ lastOpenedAt: new Date() }).where(eq(shareLinks.id, row.linkId));
  return { status: "ok", shopName: row.shopName, createdAt: row.createdAt, customerName: row.customerName, rig: row.rig as RigInput, result: row.result as RigResult };
}

// ------------------------------------------------------------------------------ installation hand-overs

/**
 * The same machinery for an installation record's hand-over: a 192-bit token shown once, its SHA-256 and
 * last four characters kept, withdrawn by `revokedAt`, opened at `/r/<token>` with no session.
 */
export async function createInstallationLink(access: AccessContext, recordId: string, expiresInDays?: number) {
  if (!can(access.role, "installations.edit")) throw new AccessDenied("installations.edit");
  const db = await getDb();
  const record = await db
    .select({ id: installationRecords.id })
    .from(installationRecords)
    .where(and(eq(installationRecords.id, recordId), eq(installationRecords.organisationId, access.organisation.id)))
    .get();
  if (!record) return null;
  const token = newShareToken();
  const expiresAt = expiresInDays ? new Date(Date.now() + expiresInDays * 86_400_000) : null;
  const id = newId();
  await db.insert(installationLinks).values({
    id,
    organisationId: access.organisation.id,
    installationRecordId: recordId,
    tokenHash: hashToken(token),
    tokenHint: token.slice(-4),
    createdByUserId: access.user.id,
    expiresAt,
  });
  return { id, token, url: shareUrl(token), expiresAt };
}

export async function listInstallationLinks(access: AccessContext, recordId: string) {
  if (!can(access.role, "installations.read")) throw new AccessDenied("installations.read");
  const db = await getDb();
  return db
    .select({
      id: installationLinks.id,
      tokenHint: installationLinks.tokenHint,
      createdAt: installationLinks.createdAt,
      expiresAt: installationLinks.expiresAt,
      revokedAt: installationLinks.revokedAt,
      lastOpenedAt: installationLinks.lastOpenedAt,
    })
    .from(installationLinks)
    .where(and(eq(installationLinks.installationRecordId, recordId), eq(installationLinks.organisationId, access.organisation.id)))
    .orderBy(desc(installationLinks.createdAt));
}

/** Withdraws a hand-over link; returns the record it belonged to, or undefined when there was no open link. */
export async function revokeInstallationLink(access: AccessContext, linkId: string): Promise<string | undefined> {
  if (!can(access.role, "installations.edit")) throw new AccessDenied("installations.edit");
  const db = await getDb();
  const [revoked] = await db
    .update(installationLinks)
    .set({ revokedAt: new Date() })
    .where(and(eq(installationLinks.id, linkId), eq(installationLinks.organisationId, access.organisation.id), isNull(installationLinks.revokedAt)))
    .returning({ recordId: installationLinks.installationRecordId });
  return revoked?.recordId;
}

export type ResolvedInstallationLink =
  | { status: "ok"; linkId: string; organisationId: string; recordId: string; shopName: string }
  | { status: "gone"; reason: "revoked" | "expired" | "not-found" };

/** What a hand-over link opens, with no session: the record's id and the shop's name. Withdrawn or expired: nothing. */
export async function resolveInstallationToken(token: string, options: { touch?: boolean } = {}): Promise<ResolvedInstallationLink> {
  if (!/^[A-Za-z0-9_-]{20,100}$/.test(token)) return { status: "gone", reason: "not-found" };
  const db = await getDb();
  const row = await db
    .select({
      linkId: installationLinks.id,
      organisationId: installationLinks.organisationId,
      recordId: installationLinks.installationRecordId,
      expiresAt: installationLinks.expiresAt,
      revokedAt: installationLinks.revokedAt,
      shopName: organisations.name,
    })
    .from(installationLinks)
    .innerJoin(organisations, eq(installationLinks.organisationId, organisations.id))
    .where(eq(installationLinks.tokenHash, hashToken(token)))
    .get();
  if (!row) return { status: "gone", reason: "not-found" };
  if (row.revokedAt) return { status: "gone", reason: "revoked" };
  if (row.expiresAt && row.expiresAt.getTime() <= Date.now()) return { status: "gone", reason: "expired" };
  if (options.touch !== false) await db.update(installationLinks).set({ lastOpenedAt: new Date() }).where(eq(installationLinks.id, row.linkId));
  return { status: "ok", linkId: row.linkId, organisationId: row.organisationId, recordId: row.recordId, shopName: row.shopName };
}
