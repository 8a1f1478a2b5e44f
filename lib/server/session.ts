import "server-only";
import { createHash } from "node:crypto";
import { and, eq, lte, ne, sql } from "drizzle-orm";
import { Lucia, TimeSpan, type Adapter, type DatabaseSession, type DatabaseUser, type Session, type User } from "lucia";
import { cookies } from "next/headers";
import { cache } from "react";
import { getDb, type Database } from "@/db/client";
import { sessions, users } from "@/db/schema";
import { env } from "@/lib/env";
import { sessionCookieSettings } from "./session-cookie";

declare module "lucia" {
  interface Register {
    Lucia: Awaited<ReturnType<typeof createLucia>>;
    DatabaseUserAttributes: { email: string; name: string };
    DatabaseSessionAttributes: { organisationId: string | null };
  }
}

/** Sessions end this long after they began, however often they are renewed. */
export const SESSION_ABSOLUTE_LIFETIME_MS = 90 * 24 * 60 * 60 * 1000;

/** What the sessions table keeps of a session id: its SHA-256, so a copy of the table opens no session. */
export function sessionKey(sessionId: string): string {
  return createHash("sha256").update(sessionId).digest("hex");
}

/**
 * Our own lucia adapter. The cookie carries the session id; the table keys the row by the id's SHA-256
 * (`sessionKey`), and every method hashes the id it is given. The lookup every signed-in request makes is
 * one prepared statement joining the session to its person. A session past its absolute lifetime is deleted
 * when it is next looked up, and renewal never moves its expiry past that lifetime.
 */
function sessionAdapter(db: Database): Adapter {
  const lookup = db
    .select({
      userId: sessions.userId,
      expiresAt: sessions.expiresAt,
      createdAt: sessions.createdAt,
      organisationId: sessions.organisationId,
      email: users.email,
      name: users.name,
    })
    .from(sessions)
    .innerJoin(users, eq(sessions.userId, users.id))
    .where(eq(sessions.id, sql.placeholder("key")))
    .prepare();
  const absoluteEndSeconds = (createdAt: Date) => Math.floor((createdAt.getTime() + SESSION_ABSOLUTE_LIFETIME_MS) / 1000);
  return {
    async getUserSessions(userId): Promise<DatabaseSession[]> {
      const rows = await db.select().from(sessions).where(eq(sessions.userId, userId));
      // Only the hashes are known here; they serve to count and list, not to open a session.
      return rows.map((row) => ({ id: row.id, userId: row.userId, expiresAt: new Date(row.expiresAt * 1000), attributes: { organisationId: row.organisationId } }));
    },
    async setSession(session) {
      await db.insert(sessions).values({
        id: sessionKey(session.id),
        userId: session.userId,
        expiresAt: Math.floor(session.expiresAt.getTime() / 1000),
        organisationId: session.attributes.organisationId,
      });
    },
    async updateSessionExpiration(sessionId, expiresAt) {
      const key = sessionKey(sessionId);
      const row = await db.select({ createdAt: sessions.createdAt }).from(sessions).where(eq(sessions.id, key)).get();
      if (!row) return;
      const seconds = Math.min(Math.floor(expiresAt.getTime() / 1000), absoluteEndSeconds(row.createdAt));
      await db.update(sessions).set({ expiresAt: seconds }).where(eq(sessions.id, key));
    },
    async deleteSession(sessionId) {
      await db.delete(sessions).where(eq(sessions.id, sessionKey(sessionId)));
    },
    async deleteUserSessions(userId) {
      await db.delete(sessions).where(eq(sessions.userId, userId));
    },
    async deleteExpiredSessions() {
      await db.delete(sessions).where(lte(sessions.expiresAt, Math.floor(Date.now() / 1000)));
    },
    async getSessionAndUser(sessionId): Promise<[DatabaseSession | null, DatabaseUser | null]> {
      const key = sessionKey(sessionId);
      const row = await lookup.get({ key });
      if (!row) return [null, null];
      if (Date.now() >= row.createdAt.getTime() + SESSION_ABSOLUTE_LIFETIME_MS) {
        await db.delete(sessions).where(eq(sessions.id, key));
        return [null, null];
      }
      return [
        { id: sessionId, userId: row.userId, expiresAt: new Date(row.expiresAt * 1000), attributes: { organisationId: row.organisationId } },
        { id: row.userId, attributes: { email: row.email, name: row.name } },
      ];
    },
  };
}

async function createLucia() {
  const db = await getDb();
  const cookie = sessionCookieSettings(env.NODE_ENV === "production");
  return new Lucia(sessionAdapter(db), {
    // Thirty days, renewed when half of it has passed (lucia's rule), and never past the absolute lifetime.
    sessionExpiresIn: new TimeSpan(30, "d"),
    sessionCookie: { name: cookie.name, expires: true, attributes: cookie.attributes },
    getUserAttributes: (attributes) => ({ email: attributes.email, name: attributes.name }),
    getSessionAttributes: (attributes) => ({ organisationId: attributes.organisationId }),
  });
}

let luciaPromise: ReturnType<typeof createLucia> | undefined;
export function getLucia() {
  luciaPromise ??= createLucia();
  return luciaPromise;
}

export type SessionResult = { user: User; session: Session } | { user: null; session: null };

/**
 * The signed-in user and session for this request, validated once per request. A session that passed half
 * its lifetime is renewed; an invalid cookie is cleared. Cookie writes fail silently while a Server
 * Component renders (they are not allowed there); actions and route handlers do write them.
 */
export const getCurrentSession = cache(async (): Promise<SessionResult> => {
  const jar = await cookies();
  const lucia = await getLucia();
  const sessionId = jar.get(lucia.sessionCookieName)?.value ?? null;
  if (!sessionId) return { user: null, session: null };
  const result = await lucia.validateSession(sessionId);
  try {
    if (result.session?.fresh) {
      const cookie = lucia.createSessionCookie(result.session.id);
      jar.set(cookie.name, cookie.value, cookie.attributes);
    }
    if (!result.session) {
      const cookie = lucia.createBlankSessionCookie();
      jar.set(cookie.name, cookie.value, cookie.attributes);
    }
  } catch {
    // Rendering a Server Component: the next action or route handler will set it.
  }
  return result.session ? { user: result.user, session: result.session } : { user: null, session: null };
});

/** Starts a new session (a new id every sign-in: no fixation) and sets its cookie. */
export async function startSession(userId: string, organisationId: string | null): Promise<void> {
  const lucia = await getLucia();
  const session = await lucia.createSession(userId, { organisationId });
  const cookie = lucia.createSessionCookie(session.id);
  (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
}

/** Ends this session on the server and clears its cookie. */
export async function endSession(): Promise<void> {
  const lucia = await getLucia();
  const { session } = await getCurrentSession();
  if (session) await lucia.invalidateSession(session.id);
  const cookie = lucia.createBlankSessionCookie();
  (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
}

export async function endAllSessionsOf(userId: string): Promise<void> {
  const lucia = await getLucia();
  await lucia.invalidateUserSessions(userId);
}

/** Ends every session of the account except the one given (after a password change, on this device). */
export async function endOtherSessionsOf(userId: string, keepSessionId: string): Promise<void> {
  const db = await getDb();
  await db.delete(sessions).where(and(eq(sessions.userId, userId), ne(sessions.id, sessionKey(keepSessionId))));
}
