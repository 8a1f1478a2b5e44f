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
  /** Label photos and PDFs: the local folder used unless S3_BUCKET is set, and the largest file accepted. */
  UPLOAD_DIR: z.string().min(1).default("./data/uploads"),
  UPLOAD_MAX_BYTES: z.coerce.number().int().min(1024).max(100 * 1024 * 1024).default(8 * 1024 * 1024),
  /** With a bucket, documents go to S3 (or an S3-compatible store at S3_ENDPOINT) instead of UPLOAD_DIR. */
  S3_BUCKET: z.string().optional(),
  S3_REGION: z.string().default("us-east-1"),
  S3_ENDPOINT: z.url().optional(),
  S3_ACCESS_KEY_ID: z.string().optional(),
  S3_SECRET_ACCESS_KEY: z.string().optional(),
  S3_FORCE_PATH_STYLE: flag.default(false),
  S3_PREFIX: z.string().default("vehicle-documents/"),
  /** POST /api/v1/evaluate requests allowed per minute per client address. */
  EVALUATE_LIMIT_PER_MINUTE: z.coerce.number().int().min(1).default(120),
  /**
   * Reverse proxies in front of the server whose X-Forwarded-For is believed. 0: none, the connection's own
   * address counts and a forwarding header the client sent is ignored. Set it to the number of proxies.
   */
  TRUSTED_PROXY_HOPS: z.coerce.number().int().min(0).max(10).default(0),
  /** Mail sent on a member's behalf (invitations, customer links) per hour: per member, per organisation. */
  MAIL_LIMIT_PER_MEMBER_PER_HOUR: z.coerce.number().int().min(1).default(30),
  MAIL_LIMIT_PER_ORGANISATION_PER_HOUR: z.coerce.number().int().min(1).default(100),
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
