import "server-only";
import { and, eq, gt, isNull } from "drizzle-orm";
import { getDb } from "@/db/client";
import { memberships, organisations, passwordResets, signupRequests, users } from "@/db/schema";
import { absoluteUrl, composeMail, sendMail } from "./mail";
import type { SignUpInput } from "@/lib/validation/auth";
import { hashPassword, verifyAgainstDecoy, verifyPassword } from "./passwords";
import { endAllSessionsOf } from "./session";
import { hashToken, newId, newToken } from "./tokens";

const RESET_LIFETIME_MS = 60 * 60 * 1000;

export async function findUserByEmail(email: string) {
  const db = await getDb();
  return db.select().from(users).where(eq(users.email, email)).get();
}

const SIGNUP_LIFETIME_MS = 24 * 60 * 60 * 1000;

/**
 * Records a sign-up and mails the link that finishes it. An address that already has an account gets a
 * notice instead (sign in, or reset the password). The caller shows one message either way, and both
 * branches do the same hashing, so neither the answer nor its timing tells whether the account exists.
 */
export async function requestSignup(input: SignUpInput): Promise<boolean> {
  const passwordHash = await hashPassword(input.password);
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
    passwordHash,
    organisationName: input.organisationName,
    organisationKind: input.organisationKind,
    expiresAt: new Date(Date.now() + SIGNUP_LIFETIME_MS),
  });
  const mail = composeMail({
    heading: "Confirm your address to finish signing up",
    paragraphs: [
      `Welcome, ${input.name}. Open the link to create ${input.organisationName} on Towmargin; you will be its owner.`,
      "The link works once and for 24 hours.",
    ],
    actionLabel: "Finish signing up",
    actionUrl: absoluteUrl(`/sign-up/confirm/${token}`),
    footer: "If you did not sign up, ignore this message: no account is made until the link is opened.",
  });
  return sendMail({ to: input.email, subject: "Finish signing up to Towmargin", ...mail });
}

/**
 * Spends a sign-up link: makes the account, its organisation and the owner's membership in one transaction.
 * Returns null when the link is unknown, used or expired, or the address has gained an account meanwhile.
 */
export async function confirmSignup(token: string): Promise<{ userId: string; organisationId: string } | null> {
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
      await tx.insert(users).values({ id: userId, email: request.email, name: request.name, passwordHash: request.passwordHash });
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

/** Mails a single-use reset link (one hour) when an account uses this address; silent otherwise. */
export async function requestPasswordReset(email: string): Promise<void> {
  const user = await findUserByEmail(email);
  if (!user) return;
  const db = await getDb();
  const token = newToken();
  await db.insert(passwordResets).values({
    tokenHash: hashToken(token),
    userId: user.id,
    expiresAt: new Date(Date.now() + RESET_LIFETIME_MS),
  });
  const mail = composeMail({
    heading: "Choose a new password",
    paragraphs: [`Hello ${user.name}. Open the link to choose a new Towmargin password.`, "The link works once and for one hour. Choosing a new password signs you out everywhere."],
    actionLabel: "Choose a new password",
    actionUrl: absoluteUrl(`/reset-password/${token}`),
    footer: "If you did not ask for this, ignore this message: your password stays as it is.",
  });
  await sendMail({ to: user.email, subject: "Your Towmargin password", ...mail });
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
 */
export async function resetPassword(token: string, password: string): Promise<string | null> {
  const db = await getDb();
  const passwordHash = await hashPassword(password);
  // Claim the token first, with a conditional update: two submissions of one link cannot both win.
  const claimed = await db
    .update(passwordResets)
    .set({ usedAt: new Date() })
    .where(and(eq(passwordResets.tokenHash, hashToken(token)), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, new Date())))
    .returning({ userId: passwordResets.userId });
  const userId = claimed[0]?.userId;
  if (!userId) return null;
  await db.update(users).set({ passwordHash }).where(eq(users.id, userId));
  await endAllSessionsOf(userId);
  return userId;
}
