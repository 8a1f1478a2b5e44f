import { z } from "zod";
import { ROLES } from "@/lib/roles";
import { COUNTRIES } from "@/lib/towing/rules/places";

export const emailField = z
  .string({ error: "Enter an e-mail address." })
  .trim()
  .toLowerCase()
  .min(1, "Enter an e-mail address.")
  .max(254, "That address is too long.")
  .pipe(z.email({ error: "Enter an e-mail address like name@example.com." }));

// Long enough to resist guessing; capped so hashing cannot be used to tie up the server.
export const newPasswordField = z
  .string({ error: "Choose a password." })
  .min(10, "Use at least 10 characters.")
  .max(128, "Use at most 128 characters.");

const personName = z
  .string({ error: "Enter your name." })
  .trim()
  .min(1, "Enter your name.")
  .max(80, "Use at most 80 characters.");

export const signInSchema = z.object({
  email: emailField,
  password: z.string({ error: "Enter your password." }).min(1, "Enter your password.").max(128, "That password is too long."),
  next: z.string().max(500).optional(),
});

export const signUpSchema = z.object({
  name: personName,
  email: emailField,
  organisationName: z
    .string({ error: "Name your shop or fleet." })
    .trim()
    .min(2, "Use at least 2 characters.")
    .max(80, "Use at most 80 characters."),
  organisationKind: z.enum(["shop", "fleet"], { error: "Choose a hitch shop or a fleet." }),
});

export const forgotPasswordSchema = z.object({ email: emailField });

export const resetPasswordSchema = z
  .object({
    token: z.string().min(10).max(200),
    password: newPasswordField,
    confirmPassword: z.string(),
  })
  .refine((value) => value.password === value.confirmPassword, {
    path: ["confirmPassword"],
    message: "The two passwords differ.",
  });

const linkToken = z.string({ error: "This link is not complete. Open it again from the mail." }).min(10, "This link is not complete. Open it again from the mail.").max(200, "This link is not complete. Open it again from the mail.");

/** The sign-up link's page: the password is chosen here, once the address has proved it reads its mail. */
export const confirmSignupSchema = z
  .object({
    token: linkToken,
    password: newPasswordField,
    confirmPassword: z.string({ error: "Type the password again." }),
  })
  .refine((value) => value.password === value.confirmPassword, {
    path: ["confirmPassword"],
    message: "The two passwords differ.",
  });

export const changePasswordSchema = z
  .object({
    currentPassword: z.string({ error: "Enter your current password." }).min(1, "Enter your current password.").max(128, "That password is too long."),
    password: newPasswordField,
    confirmPassword: z.string({ error: "Type the new password again." }),
  })
  .refine((value) => value.password === value.confirmPassword, {
    path: ["confirmPassword"],
    message: "The two passwords differ.",
  });

export const acceptInvitationSchema = z.object({
  token: z.string().min(10).max(200),
  name: personName,
  password: newPasswordField,
});

export const roleField = z.enum(ROLES, { error: "Choose a role." });

export const inviteSchema = z.object({ email: emailField, role: roleField });

export const changeRoleSchema = z.object({ membershipId: z.string().min(1).max(64), role: roleField });

export const removeMemberSchema = z.object({ membershipId: z.string().min(1).max(64) });

export const revokeInvitationSchema = z.object({ invitationId: z.string().min(1).max(64) });

export const organisationSettingsSchema = z.object({
  name: z.string().trim().min(2, "Use at least 2 characters.").max(80, "Use at most 80 characters."),
  units: z.enum(["imperial", "metric"], { error: "Choose imperial or metric." }),
  tightMarginPercent: z.coerce
    .number({ error: "Enter a percentage." })
    .min(1, "Use at least 1 %.")
    .max(50, "Use at most 50 %."),
  /** Common practice, no published source: the share of the unhitched front axle it may lose to the hitch load. */
  frontAxleLossPercent: z.coerce
    .number({ error: "Enter a percentage." })
    .min(1, "Use at least 1 %.")
    .max(50, "Use at most 50 %."),
  linkLifetimeDays: z.coerce
    .number({ error: "Enter a number of days." })
    .int("Use whole days.")
    .min(1, "Use at least 1 day.")
    .max(730, "Use at most 730 days (two years)."),
  /** Where the organisation works; "" for not set (no local rules are read). */
  country: z
    .string()
    .optional()
    .transform((v) => v || undefined)
    .refine((v) => v === undefined || COUNTRIES.some((c) => c.code === v), { error: "Country: choose one from the list." }),
  region: z
    .string()
    .optional()
    .transform((v) => v || undefined),
}).superRefine((value, ctx) => {
  if (value.region === undefined) return;
  const country = COUNTRIES.find((c) => c.code === value.country);
  if (!country || !country.regions.some((r) => r.code === value.region))
    ctx.addIssue({ code: "custom", path: ["region"], message: "State or province: choose one from the list for this country." });
});

export type SignInInput = z.infer<typeof signInSchema>;
export type SignUpInput = z.infer<typeof signUpSchema>;
export type ConfirmSignupInput = z.infer<typeof confirmSignupSchema>;
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;
export type InviteInput = z.infer<typeof inviteSchema>;
export type OrganisationSettingsInput = z.infer<typeof organisationSettingsSchema>;

const RETURN_BASE = "https://towmargin.invalid";

/**
 * Only a path of this app may be a place to return to after sign-in. The value is resolved the way a browser
 * resolves a Location header (which drops tabs and newlines and reads a backslash as a slash), and only the
 * path, query and fragment are kept when it stays on the app's own origin. Control characters, backslashes
 * and encoded slashes or backslashes are refused outright: a proxy or framework may decode them on the way.
 */
export function safeReturnPath(next: string | undefined | null): string {
  const fallback = "/overview";
  if (!next || !next.startsWith("/")) return fallback;
  if (/[\u0000-\u001f\u007f-\u009f\\]|\s/.test(next) || /%(2f|5c|0[0-9a-f]|1[0-9a-f]|7f)/i.test(next)) return fallback;
  let url: URL;
  try {
    url = new URL(next, `${RETURN_BASE}/sign-in`);
  } catch {
    return fallback;
  }
  if (url.origin !== RETURN_BASE) return fallback;
  const path = `${url.pathname}${url.search}${url.hash}`;
  return path.startsWith("//") ? fallback : path;
}
