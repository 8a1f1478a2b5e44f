import { sql } from "drizzle-orm";
import { customType, index, integer, primaryKey, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { deflateRawSync, inflateRawSync } from "node:zlib";
import { ROLES } from "../lib/roles";

const timestampNow = (name = "created_at") =>
  integer(name, { mode: "timestamp_ms" })
    .notNull()
    .default(sql`(unixepoch('subsec') * 1000)`);

/**
 * JSON kept deflated: a saved check's full result is about 24 KB as text and 6 KB deflated, so the table,
 * its write-ahead log and every checkpoint carry a quarter of the bytes. The column stays declared TEXT,
 * which in SQLite holds a BLOB as it is (no migration), and a row written as plain JSON still reads.
 */
const deflatedJson = customType<{ data: unknown; driverData: Uint8Array | ArrayBuffer | string }>({
  dataType: () => "text",
  toDriver: (value) => deflateRawSync(JSON.stringify(value), { level: 1 }),
  fromDriver: (value) =>
    JSON.parse(typeof value === "string" ? value : inflateRawSync(value instanceof ArrayBuffer ? new Uint8Array(value) : value).toString("utf8")),
});

export const users = sqliteTable("users", {
  id: text("id").primaryKey(),
  /** Stored lower-cased and trimmed: one address, one account. */
  email: text("email").notNull().unique(),
  name: text("name").notNull(),
  passwordHash: text("password_hash").notNull(),
  createdAt: timestampNow(),
});

export const organisations = sqliteTable("organisations", {
  id: text("id").primaryKey(),
  name: text("name").notNull(),
  kind: text("kind", { enum: ["shop", "fleet"] }).notNull(),
  units: text("units", { enum: ["imperial", "metric"] }).notNull().default("imperial"),
  /** A check whose margin is under this share of its limit is reported as tight. */
  tightMarginRatio: real("tight_margin_ratio").notNull().default(0.1),
  /**
   * Share of the front axle's unhitched load it may lose to the hitch load before the check reads tight.
   * Common practice, no published source: 10 % unless the owner sets another.
   */
  frontAxleLossRatio: real("front_axle_loss_ratio").notNull().default(0.1),
  /** How long a new customer link works unless the person making it chooses otherwise. */
  linkLifetimeDays: integer("link_lifetime_days").notNull().default(180),
  /** Where the organisation works: a country code (lib/towing/rules/places.ts) and, where rules differ, a region. */
  country: text("country"),
  region: text("region"),
  createdAt: timestampNow(),
});

export const sessions = sqliteTable(
  "sessions",
  {
    /** SHA-256 of the session id the cookie carries: a copy of this table opens no session. */
    id: text("id").primaryKey(),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    /** When the session began: it ends at its absolute lifetime however often it is renewed. */
    createdAt: timestampNow(),
    /** Seconds since the epoch, as the session library stores it. */
    expiresAt: integer("expires_at").notNull(),
    /** The organisation this session works in; checked against memberships on every request. */
    organisationId: text("organisation_id").references(() => organisations.id, { onDelete: "set null" }),
  },
  (table) => [index("sessions_user_idx").on(table.userId)],
);

export const memberships = sqliteTable(
  "memberships",
  {
    id: text("id").primaryKey(),
    organisationId: text("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: text("role", { enum: ROLES }).notNull(),
    createdAt: timestampNow(),
  },
  (table) => [
    uniqueIndex("memberships_org_user_idx").on(table.organisationId, table.userId),
    index("memberships_user_idx").on(table.userId),
  ],
);

export const invitations = sqliteTable(
  "invitations",
  {
    id: text("id").primaryKey(),
    organisationId: text("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    role: text("role", { enum: ROLES }).notNull(),
    /** SHA-256 of the token in the link; the token itself is never stored. */
    tokenHash: text("token_hash").notNull().unique(),
    invitedByUserId: text("invited_by_user_id").references(() => users.id, { onDelete: "set null" }),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    acceptedAt: integer("accepted_at", { mode: "timestamp_ms" }),
    revokedAt: integer("revoked_at", { mode: "timestamp_ms" }),
    createdAt: timestampNow(),
  },
  (table) => [index("invitations_org_idx").on(table.organisationId)],
);

export const passwordResets = sqliteTable("password_resets", {
  tokenHash: text("token_hash").primaryKey(),
  userId: text("user_id")
    .notNull()
    .references(() => users.id, { onDelete: "cascade" }),
  expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
  usedAt: integer("used_at", { mode: "timestamp_ms" }),
  createdAt: timestampNow(),
});

/**
 * A sign-up waiting for its address to be confirmed. The account and its organisation are made only when the
 * link in the mail is opened, so sign-up answers the same whether or not the address already has an account.
 */
export const signupRequests = sqliteTable("signup_requests", {
  tokenHash: text("token_hash").primaryKey(),
  email: text("email").notNull(),
  name: text("name").notNull(),
  organisationName: text("organisation_name").notNull(),
  organisationKind: text("organisation_kind", { enum: ["shop", "fleet"] }).notNull(),
  expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
  usedAt: integer("used_at", { mode: "timestamp_ms" }),
  createdAt: timestampNow(),
});

/** Mail kept by the local fake SMTP server (demo, development, tests). Never used in production. */
export const capturedMail = sqliteTable("captured_mail", {
  id: integer("id").primaryKey({ autoIncrement: true }),
  envelopeFrom: text("envelope_from").notNull(),
  envelopeTo: text("envelope_to").notNull(),
  subject: text("subject").notNull(),
  text: text("text").notNull(),
  html: text("html"),
  receivedAt: timestampNow("received_at"),
});

export type User = typeof users.$inferSelect;
export type Organisation = typeof organisations.$inferSelect;
export type Membership = typeof memberships.$inferSelect;
export type Invitation = typeof invitations.$inferSelect;

/**
 * Profiles: the parts of a rig a shop or fleet keeps to pick again. `data` holds the core's own input
 * shapes (lib/towing/input.ts) in the profile's unit system, so a profile drops straight into a check.
 */
const profileColumns = () => ({
  id: text("id").primaryKey(),
  organisationId: text("organisation_id")
    .notNull()
    .references(() => organisations.id, { onDelete: "cascade" }),
  name: text("name").notNull(),
  units: text("units", { enum: ["imperial", "metric"] }).notNull(),
  data: text("data", { mode: "json" }).notNull(),
  archivedAt: integer("archived_at", { mode: "timestamp_ms" }),
  createdAt: timestampNow(),
  updatedAt: timestampNow("updated_at"),
});

export const vehicleProfiles = sqliteTable(
  "vehicle_profiles",
  {
    ...profileColumns(),
    /**
     * Where figures in `data` came from, by rig path ("hitch.receiverHeight"): the installation record that
     * measured or read them and its date. A figure typed on the profile form has no entry.
     */
    figureSources: text("figure_sources", { mode: "json" }),
  },
  (table) => [index("vehicle_profiles_org_idx").on(table.organisationId)],
);
export const trailerProfiles = sqliteTable("trailer_profiles", profileColumns(), (table) => [
  index("trailer_profiles_org_idx").on(table.organisationId),
]);
export const accessoryProfiles = sqliteTable("accessory_profiles", profileColumns(), (table) => [
  index("accessory_profiles_org_idx").on(table.organisationId),
]);

/**
 * A saved check: an immutable snapshot of the inputs and the results, with the core version that computed
 * them. Never updated; "duplicate" starts a new check from its inputs.
 */
export const savedChecks = sqliteTable(
  "saved_checks",
  {
    id: text("id").primaryKey(),
    organisationId: text("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    createdByUserId: text("created_by_user_id").references(() => users.id, { onDelete: "set null" }),
    customerName: text("customer_name"),
    note: text("note"),
    /** What the list shows and filters by: the vehicle profile's name or the rig's own name. */
    vehicleLabel: text("vehicle_label"),
    hitchedLabel: text("hitched_label"),
    // Results saved before core 2.0.0 read within, tight or over; "adjust" and "incomplete" come with it.
    level: text("level", { enum: ["within", "tight", "adjust", "over", "incomplete"] }).notNull(),
    complete: integer("complete", { mode: "boolean" }).notNull(),
    units: text("units", { enum: ["imperial", "metric"] }).notNull(),
    rig: text("rig", { mode: "json" }).notNull(),
    result: deflatedJson("result").notNull(),
    coreVersion: text("core_version").notNull(),
    createdAt: timestampNow(),
  },
  (table) => [index("saved_checks_org_created_idx").on(table.organisationId, table.createdAt)],
);

/** A customer's read-only link to one saved check. Only the token's SHA-256 is kept. */
export const shareLinks = sqliteTable(
  "share_links",
  {
    id: text("id").primaryKey(),
    organisationId: text("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    savedCheckId: text("saved_check_id")
      .notNull()
      .references(() => savedChecks.id, { onDelete: "cascade" }),
    tokenHash: text("token_hash").notNull().unique(),
    /** The token's last characters, so staff can tell links apart without the link itself being stored. */
    tokenHint: text("token_hint").notNull(),
    createdByUserId: text("created_by_user_id").references(() => users.id, { onDelete: "set null" }),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }),
    revokedAt: integer("revoked_at", { mode: "timestamp_ms" }),
    lastOpenedAt: integer("last_opened_at", { mode: "timestamp_ms" }),
    createdAt: timestampNow(),
  },
  (table) => [index("share_links_check_idx").on(table.savedCheckId)],
);

export type SavedCheck = typeof savedChecks.$inferSelect;
export type ShareLink = typeof shareLinks.$inferSelect;

/** A photo or PDF of a label, kept with a vehicle profile. The bytes live in the storage module. */
export const vehicleDocuments = sqliteTable(
  "vehicle_documents",
  {
    id: text("id").primaryKey(),
    organisationId: text("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    vehicleProfileId: text("vehicle_profile_id")
      .notNull()
      .references(() => vehicleProfiles.id, { onDelete: "cascade" }),
    kind: text("kind", { enum: ["door-jamb-label", "hitch-label", "other"] }).notNull(),
    fileName: text("file_name").notNull(),
    /** Detected from the file's content, not its name. */
    contentType: text("content_type").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    storageKey: text("storage_key").notNull(),
    uploadedByUserId: text("uploaded_by_user_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestampNow(),
  },
  (table) => [index("vehicle_documents_vehicle_idx").on(table.vehicleProfileId)],
);

/**
 * A worked example for training: a rig, a short story, and the check it teaches. The steps come from the
 * core when the lesson is shown, so a lesson always agrees with what the counter sees.
 */
export const lessons = sqliteTable(
  "lessons",
  {
    id: text("id").primaryKey(),
    organisationId: text("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    authorUserId: text("author_user_id").references(() => users.id, { onDelete: "set null" }),
    title: text("title").notNull(),
    story: text("story").notNull(),
    question: text("question").notNull(),
    /** The check family the lesson is about (a core check id). */
    checkId: text("check_id").notNull(),
    /** The rule the example illustrates, in a sentence. */
    rule: text("rule").notNull(),
    rig: text("rig", { mode: "json" }).notNull(),
    /** draft: authors only; organisation: every member; public: anyone with the link. */
    visibility: text("visibility", { enum: ["draft", "organisation", "public"] }).notNull().default("draft"),
    /** SHA-256 of the public link's token; null until published publicly. */
    publicTokenHash: text("public_token_hash").unique(),
    sourceCheckId: text("source_check_id").references(() => savedChecks.id, { onDelete: "set null" }),
    createdAt: timestampNow(),
    updatedAt: timestampNow("updated_at"),
  },
  (table) => [index("lessons_org_idx").on(table.organisationId)],
);

export const courses = sqliteTable(
  "courses",
  {
    id: text("id").primaryKey(),
    organisationId: text("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    title: text("title").notNull(),
    description: text("description").notNull().default(""),
    createdByUserId: text("created_by_user_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestampNow(),
  },
  (table) => [index("courses_org_idx").on(table.organisationId)],
);

export const courseLessons = sqliteTable(
  "course_lessons",
  {
    courseId: text("course_id")
      .notNull()
      .references(() => courses.id, { onDelete: "cascade" }),
    lessonId: text("lesson_id")
      .notNull()
      .references(() => lessons.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
  },
  (table) => [uniqueIndex("course_lessons_pk").on(table.courseId, table.lessonId)],
);

/** One learner's answers to one lesson's steps, marked within a tolerance. */
export const practiceAttempts = sqliteTable(
  "practice_attempts",
  {
    id: text("id").primaryKey(),
    organisationId: text("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    lessonId: text("lesson_id")
      .notNull()
      .references(() => lessons.id, { onDelete: "cascade" }),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    answers: text("answers", { mode: "json" }).notNull(),
    correct: integer("correct").notNull(),
    total: integer("total").notNull(),
    createdAt: timestampNow(),
  },
  (table) => [index("practice_attempts_lesson_idx").on(table.lessonId), index("practice_attempts_user_idx").on(table.userId)],
);

/** The shop's own fitting checklist, defined once and ticked on every installation record. */
export const installationChecklistItems = sqliteTable(
  "installation_checklist_items",
  {
    id: text("id").primaryKey(),
    organisationId: text("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    label: text("label").notNull(),
    /** When set, the installer types a value read from the maker's instruction sheet (a torque, for one). */
    valueLabel: text("value_label"),
    position: integer("position").notNull(),
    archivedAt: integer("archived_at", { mode: "timestamp_ms" }),
    createdAt: timestampNow(),
  },
  (table) => [index("installation_checklist_items_org_idx").on(table.organisationId)],
);

/**
 * One hitch installation: the vehicle (a fleet profile, or a customer's vehicle described here), what was
 * fitted, the measurements taken after fitting, the checklist as ticked, and the hand-over. Figures are in
 * the record's `units`.
 */
export const installationRecords = sqliteTable(
  "installation_records",
  {
    id: text("id").primaryKey(),
    organisationId: text("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    units: text("units", { enum: ["imperial", "metric"] }).notNull(),
    vehicleProfileId: text("vehicle_profile_id").references(() => vehicleProfiles.id, { onDelete: "set null" }),
    /** A customer's vehicle in words ("grey two-door coupe"), when it is not a fleet profile; also kept for a profile's name at the time. */
    vehicleDescription: text("vehicle_description").notNull(),
    /** The customer's vehicle's own ratings (tow rating, tongue limit, departure angle…) when not a profile. */
    vehicle: text("vehicle", { mode: "json" }),
    customerName: text("customer_name").notNull(),
    customerEmail: text("customer_email"),
    installerUserId: text("installer_user_id").references(() => users.id, { onDelete: "set null" }),
    /** The day of the fitting, YYYY-MM-DD as the shop means it (no time zone). */
    fittedOn: text("fitted_on").notNull(),
    state: text("state", { enum: ["planned", "fitted", "handed-over"] }).notNull().default("planned"),
    hitch: text("hitch", { mode: "json" }).notNull(),
    parts: text("parts", { mode: "json" }).notNull(),
    measurements: text("measurements", { mode: "json" }).notNull(),
    checklist: text("checklist", { mode: "json" }).notNull(),
    /** A carrier depth the customer asked about, for "what this hitch allows". */
    carrierDepth: real("carrier_depth"),
    note: text("note"),
    /** When the record's figures were written into the vehicle profile. */
    appliedToProfileAt: integer("applied_to_profile_at", { mode: "timestamp_ms" }),
    handedOverAt: integer("handed_over_at", { mode: "timestamp_ms" }),
    /** When the customer confirmed on their page that they have read the limits. */
    customerConfirmedAt: integer("customer_confirmed_at", { mode: "timestamp_ms" }),
    createdByUserId: text("created_by_user_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestampNow(),
    updatedAt: timestampNow("updated_at"),
  },
  (table) => [
    index("installation_records_org_date_idx").on(table.organisationId, table.fittedOn),
    index("installation_records_vehicle_idx").on(table.vehicleProfileId),
  ],
);

/** Photos of the hitch label and the fitted hitch. The bytes live in the document store. */
export const installationPhotos = sqliteTable(
  "installation_photos",
  {
    id: text("id").primaryKey(),
    organisationId: text("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    installationRecordId: text("installation_record_id")
      .notNull()
      .references(() => installationRecords.id, { onDelete: "cascade" }),
    kind: text("kind", { enum: ["hitch-label", "fitted-hitch", "other"] }).notNull(),
    fileName: text("file_name").notNull(),
    contentType: text("content_type").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    storageKey: text("storage_key").notNull(),
    uploadedByUserId: text("uploaded_by_user_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestampNow(),
  },
  (table) => [index("installation_photos_record_idx").on(table.installationRecordId)],
);

/**
 * A customer's link to one installation record's hand-over: the same machinery as `share_links` (a 192-bit
 * token shown once, only its SHA-256 and last characters kept, withdrawn by setting `revoked_at`).
 */
export const installationLinks = sqliteTable(
  "installation_links",
  {
    id: text("id").primaryKey(),
    organisationId: text("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    installationRecordId: text("installation_record_id")
      .notNull()
      .references(() => installationRecords.id, { onDelete: "cascade" }),
    tokenHash: text("token_hash").notNull().unique(),
    tokenHint: text("token_hint").notNull(),
    createdByUserId: text("created_by_user_id").references(() => users.id, { onDelete: "set null" }),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }),
    revokedAt: integer("revoked_at", { mode: "timestamp_ms" }),
    lastOpenedAt: integer("last_opened_at", { mode: "timestamp_ms" }),
    createdAt: timestampNow(),
  },
  (table) => [index("installation_links_record_idx").on(table.installationRecordId)],
);

export type InstallationRecordRow = typeof installationRecords.$inferSelect;

/**
 * Rate-limit counters shared by every server process on the database: one fixed window per key
 * (`sign-in:address:<ip>`, `evaluate:<ip>`, …). lib/server/rate-limit.ts counts with one UPSERT … RETURNING
 * per check; rows whose window has ended are swept now and then.
 */
export const rateLimits = sqliteTable(
  "rate_limits",
  {
    key: text("key").primaryKey(),
    count: integer("count").notNull(),
    resetAt: integer("reset_at").notNull(),
  },
  (table) => [index("rate_limits_reset_at_idx").on(table.resetAt)],
);

/**
 * Each pair's verdict as the pairing matrix shows it (lib/server/pair-verdicts.ts), kept so that a verdict
 * filter over every pair of a large fleet is a query. `inputs` stamps what the verdict was worked from (the
 * core version, the organisation's thresholds and units, and both profiles' last change); a pair whose stamp
 * differs is worked out again in the background.
 */
export const pairVerdicts = sqliteTable(
  "pair_verdicts",
  {
    organisationId: text("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    vehicleId: text("vehicle_id").notNull(),
    /** A trailer's or an accessory's profile id (ids are unique across the two). */
    hitchedId: text("hitched_id").notNull(),
    level: text("level", { enum: ["within", "tight", "adjust", "over", "incomplete"] }).notNull(),
    /** The matrix cell (lib/fleet/matrix.ts `MatrixCell`) as JSON. */
    cell: text("cell").notNull(),
    inputs: text("inputs").notNull(),
  },
  (table) => [
    primaryKey({ columns: [table.organisationId, table.vehicleId, table.hitchedId] }),
    index("pair_verdicts_level_idx").on(table.organisationId, table.level, table.vehicleId, table.hitchedId),
  ],
);

/**
 * Where an organisation's stored pair verdicts stand: `fingerprint` names the fleet they were (or are being)
 * worked out for; `status` is "ready" or "rechecking". A recheck holds `claim` and renews `claimedAt` as it
 * goes; a claim left older than half a minute (its process ended) may be taken by another process.
 */
export const pairRechecks = sqliteTable("pair_rechecks", {
  organisationId: text("organisation_id")
    .primaryKey()
    .references(() => organisations.id, { onDelete: "cascade" }),
  fingerprint: text("fingerprint").notNull(),
  status: text("status", { enum: ["ready", "rechecking"] }).notNull(),
  claim: text("claim"),
  claimedAt: integer("claimed_at"),
});
