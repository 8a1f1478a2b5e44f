import { z } from "zod";

/**
 * The environment, read once and validated. Every value has a default that lets the demo run with no
 * configuration at all; production needs at most DATABASE_URL (+ token), APP_URL and the SMTP settings.
 */
const flag = z
  .enum(["on", "off", "1", "0", "true", "false"])
  .transform((value) => value === "on" || value === "1" || value === "true");

const envSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z.string().min(1).default("file:./data/towmargin.db"),
  DATABASE_AUTH_TOKEN: z.string().optional(),
  APP_URL: z.url().default("http://localhost:3000"),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  SMTP_SECURE: flag.default(false),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().default("Towmargin <no-reply@towmargin.example.com>"),
  /** The captured-mail page. Off unless asked for: the demo and the tests turn it on. */
  DEV_MAILBOX: flag.default(false),
  /** Sign-in and sign-up attempts allowed per 15 minutes, per account and per client address. */
  AUTH_LIMIT_PER_ACCOUNT: z.coerce.number().int().min(1).default(8),
  AUTH_LIMIT_PER_ADDRESS: z.coerce.number().int().min(1).default(40),
});

export type Env = z.infer<typeof envSchema>;

function readEnv(): Env {
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((issue) => `${issue.path.join(".")}: ${issue.message}`);
    throw new Error(`Towmargin cannot start: the environment is not valid.\n${problems.join("\n")}`);
  }
  return parsed.data;
}

export const env = readEnv();
