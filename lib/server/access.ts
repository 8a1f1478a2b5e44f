import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { forbidden, redirect } from "next/navigation";
import { cache } from "react";
import { getDb, type Database } from "@/db/client";
import { memberships, organisations, sessions, type Organisation } from "@/db/schema";
import { can, type Permission, type Role } from "@/lib/roles";
import { getCurrentSession, sessionKey } from "./session";

export interface AccessContext {
  user: { id: string; email: string; name: string };
  sessionId: string;
  organisation: Pick<Organisation, "id" | "name" | "kind" | "units" | "tightMarginRatio" | "frontAxleLossRatio" | "country" | "region">;
  role: Role;
  /** Every organisation this person belongs to, for the switcher. */
  memberships: Array<{ organisationId: string; organisationName: string; role: Role }>;
}

/** Every request that is signed in asks this, so it is prepared once (built SQL is reused, values bound). */
let membershipsStatement: { db: Database; statement: ReturnType<typeof prepareMemberships> } | undefined;

function prepareMemberships(db: Database) {
  return db
    .select({
      organisationId: organisations.id,
      organisationName: organisations.name,
      kind: organisations.kind,
      units: organisations.units,
      tightMarginRatio: organisations.tightMarginRatio,
      frontAxleLossRatio: organisations.frontAxleLossRatio,
      country: organisations.country,
      region: organisations.region,
      role: memberships.role,
    })
    .from(memberships)
    .innerJoin(organisations, eq(memberships.organisationId, organisations.id))
    .where(eq(memberships.userId, sql.placeholder("userId")))
    .orderBy(asc(memberships.createdAt))
    .prepare();
}

function membershipsOf(db: Database) {
  if (membershipsStatement?.db !== db) membershipsStatement = { db, statement: prepareMemberships(db) };
  return membershipsStatement.statement;
}

/**
 * Who is asking, in which organisation, with which role; null when nobody is signed in or the person
 * belongs to no organisation any more. The session's organisation is honoured only while the membership
 * exists; otherwise the person's first organisation is used.
 */
export const getAccess = cache(async (): Promise<AccessContext | null> => {
  const { user, session } = await getCurrentSession();
  if (!user || !session) return null;
  const db = await getDb();
  const rows = await membershipsOf(db).all({ userId: user.id });
  if (rows.length === 0) return null;
  const current = rows.find((row) => row.organisationId === session.organisationId) ?? rows[0]!;
  if (current.organisationId !== session.organisationId) {
    await db.update(sessions).set({ organisationId: current.organisationId }).where(eq(sessions.id, sessionKey(session.id)));
  }
  return {
    user: { id: user.id, email: user.email, name: user.name },
    sessionId: session.id,
    organisation: {
      id: current.organisationId,
      name: current.organisationName,
      kind: current.kind,
      units: current.units,
      tightMarginRatio: current.tightMarginRatio,
      frontAxleLossRatio: current.frontAxleLossRatio,
      country: current.country,
      region: current.region,
    },
    role: current.role,
    memberships: rows.map((row) => ({
      organisationId: row.organisationId,
      organisationName: row.organisationName,
      role: row.role,
    })),
  };
});

/** For pages: sends a signed-out visitor to sign-in and renders the 403 page for a role without the permission. */
export async function requirePage(permission?: Permission, returnTo?: string): Promise<AccessContext> {
  const access = await getAccess();
  if (!access) redirect(returnTo ? `/sign-in?next=${encodeURIComponent(returnTo)}` : "/sign-in");
  if (permission && !can(access.role, permission)) forbidden();
  return access;
}

export type ActionRefusal = { ok: false; status: 401 | 403; message: string };

/** For server actions and route handlers: the context, or the reason to refuse before anything is read. */
export async function authorize(
  permission: Permission,
): Promise<{ ok: true; access: AccessContext } | ActionRefusal> {
  const access = await getAccess();
  if (!access) return { ok: false, status: 401, message: "Please sign in again: your session has ended." };
  if (!can(access.role, permission)) {
    return { ok: false, status: 403, message: "Your role in this organisation does not allow this." };
  }
  return { ok: true, access };
}

/** Switches the session to another organisation the person belongs to. */
export async function switchOrganisation(organisationId: string): Promise<boolean> {
  const access = await getAccess();
  if (!access) return false;
  const db = await getDb();
  const member = await db
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.userId, access.user.id), eq(memberships.organisationId, organisationId)))
    .get();
  if (!member) return false;
  await db.update(sessions).set({ organisationId }).where(eq(sessions.id, sessionKey(access.sessionId)));
  return true;
}
