import { getDb } from "@/db/client";
import { memberships, users } from "@/db/schema";
import { can, ROLES, type Permission, type Role } from "@/lib/roles";
import type { AccessContext } from "@/lib/server/access";
import { getLucia } from "@/lib/server/session";
import { ORG_A, ORG_B, PEOPLE } from "./fixture";
import { cookieJar, NavigationSignal } from "./next-mocks";

/**
 * The access matrix's machinery: who asks (anonymous, or each role in organisation A or B), what came back
 * (one outcome shape for responses, action states, redirects and rendered pages), and what was expected,
 * derived from lib/roles.ts so the test and the server read the same table.
 */
export interface Actor {
  key: string;
  role: Role | null;
  organisation: "A" | "B" | null;
  userId: string | null;
}

export const ANONYMOUS: Actor = { key: "anonymous", role: null, organisation: null, userId: null };

/** A person of each role in A (the fixture's) and in B (added here). */
export const ACTORS: Actor[] = [
  ANONYMOUS,
  ...ROLES.map((role) => ({ key: `${role} of A`, role, organisation: "A" as const, userId: ({ owner: PEOPLE.ownerA.id, staff: PEOPLE.staffA.id, trainer: PEOPLE.trainerA.id, fleet_manager: PEOPLE.fleetA.id } as const)[role] })),
  ...ROLES.map((role) => ({ key: `${role} of B`, role, organisation: "B" as const, userId: role === "owner" ? PEOPLE.ownerB.id : `u-${role}-b` })),
];

export async function addPeopleToB() {
  const db = await getDb();
  for (const role of ROLES.filter((r) => r !== "owner")) {
    await db.insert(users).values({ id: `u-${role}-b`, email: `${role.replace("_", "-")}b@example.com`, name: `${role} of B`, passwordHash: "not-a-real-hash" });
    await db.insert(memberships).values({ id: `m-${role}-b`, userId: `u-${role}-b`, organisationId: ORG_B, role });
  }
}

export async function actAsActor(actor: Actor) {
  cookieJar.clear();
  if (!actor.userId) return;
  const lucia = await getLucia();
  const session = await lucia.createSession(actor.userId, { organisationId: actor.organisation === "A" ? ORG_A : ORG_B });
  cookieJar.set(lucia.sessionCookieName, session.id);
}

/** An access context for organisation A's owner, to make the records a cell acts on through the data layer. */
export const OWNER_OF_A: AccessContext = {
  user: { id: PEOPLE.ownerA.id, email: "ownera@example.com", name: "ownerA" },
  sessionId: "fixture",
  organisation: { id: ORG_A, name: "Alder Lane Hitch", kind: "shop", units: "imperial", tightMarginRatio: 0.1, frontAxleLossRatio: 0.1, country: null, region: null },
  role: "owner",
  memberships: [{ organisationId: ORG_A, organisationName: "Alder Lane Hitch", role: "owner" }],
};

/** Who may: a permission of lib/roles.ts, anyone at all, or anyone signed in. */
export type Rule = Permission | "public" | "signed-in";

/**
 * What the entry touches: `record` — a record of A made for the cell (another organisation must find
 * nothing); `organisation` — the asker's own organisation (another organisation's member works on theirs, and
 * A's rows must stay as they were); `none` — nothing of an organisation.
 */
export type Scope = "record" | "organisation" | "none";

export type Result = "done" | "declined" | "not-found" | "refused" | "error";

export interface Outcome {
  result: Result;
  detail: string;
}

const ACCESS_MESSAGES = ["Please sign in again: your session has ended.", "Your role in this organisation does not allow this."];

export async function classify(run: () => Promise<unknown>): Promise<Outcome> {
  try {
    const value = await run();
    if (value instanceof Response) {
      const text = await value.clone().text();
      const detail = `${value.status} ${text.slice(0, 120)}`;
      if (value.status === 401 || value.status === 403) return { result: "refused", detail };
      if (value.status === 404) return { result: "not-found", detail };
      if (value.status < 300) return { result: "done", detail };
      if (value.status < 500) return { result: "declined", detail };
      return { result: "error", detail };
    }
    if (value === undefined) return { result: "done", detail: "no answer" };
    if (typeof value === "object" && value !== null && "ok" in value) {
      const state = value as { ok: boolean; message?: string };
      const detail = JSON.stringify(state).slice(0, 160);
      if (state.ok) return { result: "done", detail };
      return { result: ACCESS_MESSAGES.includes(state.message ?? "") ? "refused" : "declined", detail };
    }
    // A page's element: it rendered.
    return { result: "done", detail: "rendered" };
  } catch (error) {
    if (error instanceof NavigationSignal) {
      if (error.kind === "forbidden" || error.kind === "unauthorized") return { result: "refused", detail: error.kind };
      if (error.kind === "notFound") return { result: "not-found", detail: "notFound()" };
      if (error.url?.startsWith("/sign-in")) return { result: "refused", detail: `redirect ${error.url}` };
      return { result: "done", detail: `redirect ${error.url}` };
    }
    return { result: "error", detail: error instanceof Error ? `${error.name}: ${error.message}` : String(error) };
  }
}

export type Expectation =
  | "allowed" // done (or, for an entry whose input is not a complete one, anything but refused)
  | "refused" // 401/403, the access message, sign-in or the 403 page; nothing written
  | "isolated" // another organisation's record: refused, not found or declined; nothing written
  | "allowed-elsewhere"; // works on the asker's own organisation; A's rows unchanged

export function expectationFor(rule: Rule, scope: Scope, actor: Actor): Expectation {
  // A public entry (a link with its own token) answers everyone alike.
  if (rule === "public") return "allowed";
  if (!actor.role) return "refused";
  if (rule !== "signed-in" && !can(actor.role, rule)) return "refused";
  if (actor.organisation === "B") return scope === "record" ? "isolated" : scope === "organisation" ? "allowed-elsewhere" : "allowed";
  return "allowed";
}

/** The rows of a snapshot (tables.ts) that belong to organisation A, for cells where B may write to B. */
export function ofA(snapshot: string): string {
  const all = JSON.parse(snapshot) as Record<string, Array<Record<string, unknown>>>;
  const rows: Record<string, unknown[]> = {};
  for (const [table, list] of Object.entries(all)) {
    rows[table] = list.filter((row) => row.organisation_id === ORG_A || (table === "organisations" && row.id === ORG_A));
  }
  return JSON.stringify(rows);
}
