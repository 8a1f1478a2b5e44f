import "server-only";
import { and, eq, gt, isNull } from "drizzle-orm";
import { getDb } from "@/db/client";
import { memberships, organisations, passwordResets, sessions, signupRequests, users } from "@/db/schema";
import { absoluteUrl, composeMail, sendMail, sendMailInBackground } from "./mail";
import type { SignUpInput } from "@/lib/validation/auth";
import { hashPassword, verifyAgainstDecoy, verifyPassword } from "./passwords";
import { hashToken, newId, newToken } from "./tokens";
import type { AccessContext } from "./access";
import { endOtherSessionsOf } from "./session";

const RESET_LIFETIME_MS = 60 * 60 * 1000;

export async function findUserByEmail(email: string) {
  const db = await getDb();
  return db.select().from(users).where(eq(users.email, email)).get();
}

const SIGNUP_LIFETIME_MS = 24 * 60 * 60 * 1000;

/**
 * Records a sign-up and mails the link that finishes it. An address that already has an account gets a
 * notice instead (sign in, or reset the password). The caller shows one message either way. No password is
 * asked for here: it is chosen on the confirmation page, by whoever can read the mail, so nobody can sign up
 * with another person's address and fix the password of the account that person then confirms.
 */
export async function requestSignup(input: SignUpInput): Promise<boolean> {
  const existing = await findUserByEmail(input.email);
  if (existing) {
    const mail = composeMail({
      heading: "You already have a Towmargin account",
      paragraphs: [
        "Someone, probably you, tried to sign up with this address. It already has an account, so nothing was changed.",
        "Sign in as usual, or ask for a new password from the sign-in page.",
      ],
      actionLabel: "Sign in",
      actionUrl: absoluteUrl("/sign-in"),
      footer: "If it was not you, you can ignore this message.",
    });
    return sendMail({ to: input.email, subject: "Your Towmargin account", ...mail });
  }
  const db = await getDb();
  const token = newToken();
  await db.insert(signupRequests).values({
    tokenHash: hashToken(token),
    email: input.email,
    name: input.name,
    organisationName: input.organisationName,
    organisationKind: input.organisationKind,
    expiresAt: new Date(Date.now() + SIGNUP_LIFETIME_MS),
  });
  const mail = composeMail({
    heading: "Confirm your address to finish signing up",
    paragraphs: [
      `Welcome, ${input.name}. Open the link to create ${input.organisationName} on Towmargin; you will be its owner.`,
      "You choose your password there. The link works once and for 24 hours.",
    ],
    actionLabel: "Finish signing up",
    actionUrl: absoluteUrl(`/sign-up/confirm/${token}`),
    footer: "If you did not sign up, ignore this message: no account is made until the link is opened.",
  });
  return sendMail({ to: input.email, subject: "Finish signing up to Towmargin", ...mail });
}

/** Whether a sign-up link can still be spent (the confirmation page asks before showing its form). */
export async function isSignupUsable(token: string): Promise<boolean> {
  const db = await getDb();
  const row = await db
    .select({ email: signupRequests.email })
    .from(signupRequests)
    .where(and(eq(signupRequests.tokenHash, hashToken(token)), isNull(signupRequests.usedAt), gt(signupRequests.expiresAt, new Date())))
    .get();
  return Boolean(row);
}

/**
 * Spends a sign-up link with the password chosen on its page: makes the account, its organisation and the
 * owner's membership in one transaction. Returns null when the link is unknown, used or expired, or the
 * address has gained an account meanwhile. The token is checked before the password is hashed.
 */
export async function confirmSignup(token: string, password: string): Promise<{ userId: string; organisationId: string } | null> {
  if (!(await isSignupUsable(token))) return null;
  const passwordHash = await hashPassword(password);
  const db = await getDb();
  const userId = newId();
  const organisationId = newId();
  try {
    return await db.transaction(async (tx) => {
      const [request] = await tx
        .update(signupRequests)
        .set({ usedAt: new Date() })
        .where(and(eq(signupRequests.tokenHash, hashToken(token)), isNull(signupRequests.usedAt), gt(signupRequests.expiresAt, new Date())))
        .returning();
      if (!request) return null;
      await tx.insert(users).values({ id: userId, email: request.email, name: request.name, passwordHash });
      await tx.insert(organisations).values({ id: organisationId, name: request.organisationName, kind: request.organisationKind });
      await tx.insert(memberships).values({ id: newId(), userId, organisationId, role: "owner" });
      return { userId, organisationId };
    });
  } catch (error) {
    // The address got an account between the request and the confirmation.
    if (String((error as Error).message).includes("UNIQUE")) return null;
    throw error;
  }
}

/** The user whose password matches, or null. Takes the same time whether or not the address has an account. */
export async function verifyCredentials(email: string, password: string) {
  const user = await findUserByEmail(email);
  if (!user) {
    await verifyAgainstDecoy(password);
    return null;
  }
  return (await verifyPassword(user.passwordHash, password)) ? user : null;
}

/**
 * Mails a single-use reset link (one hour) when an account uses this address; silent otherwise. A new
 * request spends the account's older links. The mail leaves after the answer, so a known address is not
 * told apart from an unknown one by how long the relay takes.
 */
export async function requestPasswordReset(email: string): Promise<void> {
  const user = await findUserByEmail(email);
  if (!user) return;
  const db = await getDb();
  const token = newToken();
  await db.transaction(async (tx) => {
    await tx.update(passwordResets).set({ usedAt: new Date() }).where(and(eq(passwordResets.userId, user.id), isNull(passwordResets.usedAt)));
    await tx.insert(passwordResets).values({
      tokenHash: hashToken(token),
      userId: user.id,
      expiresAt: new Date(Date.now() + RESET_LIFETIME_MS),
    });
  });
  const mail = composeMail({
    heading: "Choose a new password",
    paragraphs: [`Hello ${user.name}. Open the link to choose a new Towmargin password.`, "The link works once and for one hour. Choosing a new password signs you out everywhere."],
    actionLabel: "Choose a new password",
    actionUrl: absoluteUrl(`/reset-password/${token}`),
    footer: "If you did not ask for this, ignore this message: your password stays as it is.",
  });
  sendMailInBackground({ to: user.email, subject: "Your Towmargin password", ...mail });
}

export async function isPasswordResetUsable(token: string): Promise<boolean> {
  const db = await getDb();
  const row = await db
    .select({ userId: passwordResets.userId })
    .from(passwordResets)
    .where(and(eq(passwordResets.tokenHash, hashToken(token)), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, new Date())))
    .get();
  return Boolean(row);
}

/**
 * Spends the token and sets the new password; every session of the account ends, so a stolen session
 * does not outlive the reset. Returns the user id, or null when the token is unknown, used or expired.
 * The token is looked up before anything is hashed (a made-up token costs one indexed read), and the claim,
 * the account's other open links, the password and the sessions change in one transaction.
 */
export async function resetPassword(token: string, password: string): Promise<string | null> {
  if (!(await isPasswordResetUsable(token))) return null;
  const passwordHash = await hashPassword(password);
  const db = await getDb();
  return db.transaction(async (tx) => {
    // A conditional update: two submissions of one link cannot both win.
    const [claimed] = await tx
      .update(passwordResets)
      .set({ usedAt: new Date() })
      .where(and(eq(passwordResets.tokenHash, hashToken(token)), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, new Date())))
      .returning({ userId: passwordResets.userId });
    if (!claimed) return null;
    await tx.update(passwordResets).set({ usedAt: new Date() }).where(and(eq(passwordResets.userId, claimed.userId), isNull(passwordResets.usedAt)));
    await tx.update(users).set({ passwordHash }).where(eq(users.id, claimed.userId));
    await tx.delete(sessions).where(eq(sessions.userId, claimed.userId));
    return claimed.userId;
  });
}

/**
 * A signed-in person sets a new password, proving the current one first. Every other session of the account
 * ends (a device someone else holds is signed out); this one stays. Returns false when the current password
 * does not match, and changes nothing then.
 */
export async function changePassword(access: AccessContext, currentPassword: string, newPassword: string): Promise<boolean> {
  const db = await getDb();
  const user = await db.select({ passwordHash: users.passwordHash }).from(users).where(eq(users.id, access.user.id)).get();
  if (!user || !(await verifyPassword(user.passwordHash, currentPassword))) return false;
  const passwordHash = await hashPassword(newPassword);
  await db.update(users).set({ passwordHash }).where(eq(users.id, access.user.id));
  await endOtherSessionsOf(access.user.id, access.sessionId);
  return true;
}
