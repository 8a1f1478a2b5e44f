import { getDb } from "@/db/client";
import { applyMigrations } from "@/db/migrate";
import { invitations, memberships, organisations, sessions, users } from "@/db/schema";
import type { Role } from "@/lib/roles";
import { getLucia, sessionKey } from "@/lib/server/session";
import { hashToken } from "@/lib/server/tokens";
import { cookieJar } from "./next-mocks";

export const ORG_A = "org-a";
export const ORG_B = "org-b";

export const PEOPLE = {
  ownerA: { id: "u-owner-a", org: ORG_A, role: "owner" },
  staffA: { id: "u-staff-a", org: ORG_A, role: "staff" },
  trainerA: { id: "u-trainer-a", org: ORG_A, role: "trainer" },
  fleetA: { id: "u-fleet-a", org: ORG_A, role: "fleet_manager" },
  ownerB: { id: "u-owner-b", org: ORG_B, role: "owner" },
} as const satisfies Record<string, { id: string; org: string; role: Role }>;

export type Person = keyof typeof PEOPLE;

export const INVITATION_A = { id: "inv-a", token: "invitation-token-for-org-a-0001" };

/** Two organisations with one member of each role in A and an owner in B, and an open invitation in A. */
export async function buildFixture() {
  await applyMigrations();
  const db = await getDb();
  await db.insert(organisations).values([
    { id: ORG_A, name: "Alder Lane Hitch", kind: "shop" },
    { id: ORG_B, name: "Birchmoor Fleet", kind: "fleet" },
  ]);
  for (const [key, person] of Object.entries(PEOPLE)) {
    await db.insert(users).values({ id: person.id, email: `${key.toLowerCase()}@example.com`, name: key, passwordHash: "not-a-real-hash" });
    await db.insert(memberships).values({ id: `m-${key}`, userId: person.id, organisationId: person.org, role: person.role });
  }
  await db.insert(invitations).values({
    id: INVITATION_A.id,
    organisationId: ORG_A,
    email: "newcomer@example.com",
    role: "staff",
    tokenHash: hashToken(INVITATION_A.token),
    expiresAt: new Date(Date.now() + 86_400_000),
  });
}

/** Acts as this person from now on (a real session in the database, its cookie in the jar), or as nobody. */
export async function actAs(person: Person | "anonymous") {
  cookieJar.clear();
  if (person === "anonymous") return;
  const lucia = await getLucia();
  const session = await lucia.createSession(PEOPLE[person].id, { organisationId: PEOPLE[person].org });
  cookieJar.set(lucia.sessionCookieName, session.id);
}

/** Everything an action could change, as one comparable value (sessions are left out: reading renews them). */
export async function snapshot() {
  const db = await getDb();
  return JSON.stringify({
    organisations: await db.select().from(organisations).orderBy(organisations.id),
    users: await db.select().from(users).orderBy(users.id),
    memberships: await db.select().from(memberships).orderBy(memberships.id),
    invitations: await db.select().from(invitations).orderBy(invitations.id),
  });
}

export async function sessionOrganisation(): Promise<string | null> {
  const db = await getDb();
  const lucia = await getLucia();
  const id = cookieJar.get(lucia.sessionCookieName);
  const rows = await db.select().from(sessions);
  return rows.find((row) => id !== undefined && row.id === sessionKey(id))?.organisationId ?? null;
}

export function form(values: Record<string, string>): FormData {
  const data = new FormData();
  for (const [key, value] of Object.entries(values)) data.set(key, value);
  return data;
}
