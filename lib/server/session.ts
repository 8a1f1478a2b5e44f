import "server-only";
import { DrizzleSQLiteAdapter } from "@lucia-auth/adapter-drizzle";
import { eq, sql } from "drizzle-orm";
import { Lucia, TimeSpan, type Adapter, type DatabaseSession, type DatabaseUser, type Session, type User } from "lucia";
import { cookies } from "next/headers";
import { cache } from "react";
import { getDb, type Database } from "@/db/client";
import { sessions, users } from "@/db/schema";
import { env } from "@/lib/env";

declare module "lucia" {
  interface Register {
    Lucia: Awaited<ReturnType<typeof createLucia>>;
    DatabaseUserAttributes: { email: string; name: string };
    DatabaseSessionAttributes: { organisationId: string | null };
  }
}

/**
 * The session library's own Drizzle adapter, except for the lookup every signed-in request makes: that is
 * one prepared statement joining the session to its person, where the adapter builds two queries each time.
 */
function sessionAdapter(db: Database): Adapter {
  const base = new DrizzleSQLiteAdapter(db, sessions, users);
  const lookup = db
    .select({
      id: sessions.id,
      userId: sessions.userId,
      expiresAt: sessions.expiresAt,
      organisationId: sessions.organisationId,
      email: users.email,
      name: users.name,
    })
    .from(sessions)
    .innerJoin(users, eq(sessions.userId, users.id))
    .where(eq(sessions.id, sql.placeholder("sessionId")))
    .prepare();
  return {
    getUserSessions: (userId) => base.getUserSessions(userId),
    setSession: (session) => base.setSession(session),
    updateSessionExpiration: (sessionId, expiresAt) => base.updateSessionExpiration(sessionId, expiresAt),
    deleteSession: (sessionId) => base.deleteSession(sessionId),
    deleteUserSessions: (userId) => base.deleteUserSessions(userId),
    deleteExpiredSessions: () => base.deleteExpiredSessions(),
    async getSessionAndUser(sessionId): Promise<[DatabaseSession | null, DatabaseUser | null]> {
      const row = await lookup.get({ sessionId });
      if (!row) return [null, null];
      return [
        { id: row.id, userId: row.userId, expiresAt: new Date(row.expiresAt * 1000), attributes: { organisationId: row.organisationId } },
        { id: row.userId, attributes: { email: row.email, name: row.name } },
      ];
    },
  };
}

async function createLucia() {
  const db = await getDb();
  return new Lucia(sessionAdapter(db), {
    // Thirty days, renewed when half of it has passed (lucia's rule).
    sessionExpiresIn: new TimeSpan(30, "d"),
    sessionCookie: {
      name: "towmargin_session",
      expires: true,
      attributes: { secure: env.NODE_ENV === "production", sameSite: "lax", path: "/" },
    },
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
