import { sql } from "drizzle-orm";
import {
  bigint, boolean, check, customType, date, doublePrecision, foreignKey, index, integer, jsonb, pgEnum, pgTable, primaryKey, text, timestamp,
  uniqueIndex, uuid, varchar, type AnyPgColumn,
} from "drizzle-orm/pg-core";
import { roles } from "../lib/roles";
import { schemeStatuses } from "../lib/spec/document";
import { projectStatuses } from "../lib/spec/projects";
import { fileCategories } from "../lib/files/kinds";

export const roleEnum = pgEnum("role", roles);

/** The firm that uses this Stopwright: one row, its details go on every document. */
export const firms = pgTable("firms", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
  address: text("address").notNull().default(""),
  email: text("email").notNull().default(""),
  phone: text("phone").notNull().default(""),
  website: text("website").notNull().default(""),
  /** Company registration, tax number and the like, as the firm prints them under its address. */
  registration: text("registration").notNull().default(""),
  /** The logo as PNG (an SVG upload is rasterised on saving), base64, with its size in pixels. */
  logoPng: text("logo_png"),
  logoWidth: integer("logo_width"),
  logoHeight: integer("logo_height"),
  /** Guards the details form against overwriting a colleague's save. */
  version: integer("version").notNull().default(1),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

export const users = pgTable(
  "users",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    email: text("email").notNull(),
    name: text("name").notNull(),
    role: roleEnum("role").notNull(),
    passwordHash: text("password_hash").notNull(),
    disabled: boolean("disabled").notNull().default(false),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    // E-mails are stored lower-case, so "A@x" and "a@x" are one person.
    uniqueIndex("users_email_key").on(t.email),
    check("users_email_lowercase", sql`${t.email} = lower(${t.email})`),
  ],
);

/**
 * One row per sign-in. The session cookie names its row; signing out, disabling the account or
 * changing its role revokes the row, so a copied cookie stops working at once, not when it expires.
 */
export const authSessions = pgTable(
  "auth_sessions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
  },
  (t) => [index("auth_sessions_user_idx").on(t.userId)],
);

/**
 * Failed sign-in counters (rate-limiter-flexible's PostgreSQL store, which writes rows by column
 * position: key, points, expire). Keys are hashes, so no e-mail or address is kept in clear.
 */
export const signInThrottle = pgTable("sign_in_throttle", {
  key: varchar("key", { length: 255 }).primaryKey(),
  points: integer("points").notNull().default(0),
  /** Epoch milliseconds. */
  expire: bigint("expire", { mode: "number" }),
});

export type Firm = typeof firms.$inferSelect;
export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;

// ── Projects, schemes and their contents ───────────────────────────────────────────────────────

export const projectStatusEnum = pgEnum("project_status", projectStatuses);
export const schemeStatusEnum = pgEnum("scheme_status", schemeStatuses);

/** One instrument job for one client. */
export const projects = pgTable(
  "projects",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    name: text("name").notNull(),
    clientName: text("client_name").notNull(),
    venue: text("venue").notNull().default(""),
    location: text("location").notNull().default(""),
    instrument: text("instrument").notNull().default(""),
    status: projectStatusEnum("status").notNull().default("enquiry"),
    targetDate: date("target_date"),
    /** A4 in Hz (ISO 16: 440). */
    pitchHz: doublePrecision("pitch_hz").notNull().default(440),
    /** Design temperature of the building in °C, for the speed of sound. */
    temperatureC: doublePrecision("temperature_c").notNull().default(18),
    notes: text("notes").notNull().default(""),
    archivedAt: timestamp("archived_at", { withTimezone: true }),
    createdById: uuid("created_by_id").references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [check("projects_pitch_range", sql`${t.pitchHz} between 380 and 480`)],
);

/** Who belongs to a project: the firm's people on it, and the client's committee members. */
export const projectMembers = pgTable(
  "project_members",
  {
    projectId: uuid("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
    userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    addedAt: timestamp("added_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.projectId, t.userId] })],
);

/** An alternative specification of a project; `version` guards against overwriting someone's save. */
export const schemes = pgTable(
  "schemes",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    description: text("description").notNull().default(""),
    status: schemeStatusEnum("status").notNull().default("draft"),
    /** Opened to the project's client members (the committee); false until the firm shares it. */
    sharedWithClient: boolean("shared_with_client").notNull().default(false),
    version: integer("version").notNull().default(1),
    copiedFromId: uuid("copied_from_id").references((): AnyPgColumn => schemes.id, { onDelete: "set null" }),
    accessories: jsonb("accessories").notNull().default({}),
    /** The case, the wind system and the site (lib/estimate/scheme.ts caseSchema, windSchema, siteSchema). */
    works: jsonb("works").notNull().default({}),
    updatedById: uuid("updated_by_id").references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("schemes_project_idx").on(t.projectId)],
);

/**
 * Divisions and stops keep the editor's own ids (unique within a scheme) and a fractional
 * position key, so a move rewrites only the moved row's key, never the whole list. Their other
 * properties live in `props` (validated by the scheme model in lib/estimate/scheme.ts on every
 * save), so adding a stop property needs no migration.
 */
export const divisions = pgTable(
  "divisions",
  {
    schemeId: uuid("scheme_id").notNull().references(() => schemes.id, { onDelete: "cascade" }),
    id: text("id").notNull(),
    position: text("position").notNull(),
    name: text("name").notNull(),
    props: jsonb("props").notNull(),
  },
  (t) => [primaryKey({ columns: [t.schemeId, t.id] }), index("divisions_order_idx").on(t.schemeId, t.position)],
);

export const stops = pgTable(
  "stops",
  {
    schemeId: uuid("scheme_id").notNull().references(() => schemes.id, { onDelete: "cascade" }),
    id: text("id").notNull(),
    divisionId: text("division_id").notNull(),
    position: text("position").notNull(),
    name: text("name").notNull(),
    /** What happens to the stop, in a word (dispositionOf in lib/estimate/scheme.ts): "new", "restored+revoiced", "extension" … */
    treatment: text("treatment").notNull(),
    props: jsonb("props").notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.schemeId, t.id] }),
    foreignKey({ columns: [t.schemeId, t.divisionId], foreignColumns: [divisions.schemeId, divisions.id] }).onDelete("cascade"),
    index("stops_order_idx").on(t.schemeId, t.divisionId, t.position),
  ],
);

/** Every saved change keeps a restorable snapshot of the whole document. */
export const schemeRevisions = pgTable(
  "scheme_revisions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    schemeId: uuid("scheme_id").notNull().references(() => schemes.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    document: jsonb("document").notNull(),
    note: text("note").notNull().default(""),
    authorId: uuid("author_id").references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("scheme_revisions_version_key").on(t.schemeId, t.version)],
);

export type Project = typeof projects.$inferSelect;
export type Scheme = typeof schemes.$inferSelect;
export type DivisionRow = typeof divisions.$inferSelect;
export type StopRow = typeof stops.$inferSelect;
export type SchemeRevision = typeof schemeRevisions.$inferSelect;

// ── Survey files ───────────────────────────────────────────────────────────────────────────────

export const fileCategoryEnum = pgEnum("file_category", fileCategories);
export const fileStatusEnum = pgEnum("file_status", ["pending", "ready"]);

/**
 * A survey photo, drawing or document of a project, kept in object storage under keys the server
 * makes. A row is "pending" from the moment an upload link is issued until the server has checked
 * the bytes (size, real type by content) and stored them under the final key; only "ready" files
 * are listed or served. The link to a division or stop is by the scheme's own ids.
 */
export const projectFiles = pgTable(
  "project_files",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
    status: fileStatusEnum("status").notNull().default("pending"),
    /** Where the browser uploads to; the bytes are moved to `objectKey` once checked. */
    uploadKey: text("upload_key").notNull(),
    objectKey: text("object_key"),
    thumbnailKey: text("thumbnail_key"),
    originalName: text("original_name").notNull(),
    contentType: text("content_type"),
    category: fileCategoryEnum("category").notNull().default("photo"),
    sizeBytes: integer("size_bytes"),
    width: integer("width"),
    height: integer("height"),
    caption: text("caption").notNull().default(""),
    schemeId: uuid("scheme_id").references(() => schemes.id, { onDelete: "set null" }),
    divisionId: text("division_id"),
    stopId: text("stop_id"),
    sharedWithClient: boolean("shared_with_client").notNull().default(false),
    uploadedById: uuid("uploaded_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    completedAt: timestamp("completed_at", { withTimezone: true }),
  },
  (t) => [
    index("project_files_project_idx").on(t.projectId, t.status),
    index("project_files_stop_idx").on(t.schemeId, t.stopId),
    check("project_files_one_link", sql`${t.divisionId} is null or ${t.stopId} is null`),
  ],
);

export type ProjectFile = typeof projectFiles.$inferSelect;

// ── Outgoing mail: the outbox ──────────────────────────────────────────────────────────────────

/** Raw bytes (PostgreSQL bytea), read and written as Node Buffers. */
const bytea = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => "bytea" });

export const mailStatuses = ["queued", "sent", "failed"] as const;
export const mailStatusEnum = pgEnum("mail_status", mailStatuses);

/**
 * Every message the app queued (lib/mail), with its delivery state. The queue and its retries live
 * in pg-boss's own schema; this table is what the firm can read back ("Outgoing mail").
 */
export const outgoingMail = pgTable(
  "outgoing_mail",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    /** What kind of message, e.g. "invitation", "scheme-shared", "comment". */
    kind: text("kind").notNull(),
    to: text("to").array().notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html"),
    /** The links the message carries, so they can be listed and followed: [{ label, url }]. */
    links: jsonb("links").$type<{ label: string; url: string }[]>().notNull().default([]),
    status: mailStatusEnum("status").notNull().default("queued"),
    attempts: integer("attempts").notNull().default(0),
    lastError: text("last_error"),
    /** The Message-ID the SMTP server accepted. */
    messageId: text("message_id"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    lastAttemptAt: timestamp("last_attempt_at", { withTimezone: true }),
    sentAt: timestamp("sent_at", { withTimezone: true }),
  },
  (t) => [index("outgoing_mail_created_idx").on(t.createdAt), index("outgoing_mail_status_idx").on(t.status)],
);

export const outgoingMailAttachments = pgTable(
  "outgoing_mail_attachments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    mailId: uuid("mail_id").notNull().references(() => outgoingMail.id, { onDelete: "cascade" }),
    filename: text("filename").notNull(),
    contentType: text("content_type").notNull(),
    content: bytea("content").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
  },
  (t) => [index("outgoing_mail_attachments_mail_idx").on(t.mailId)],
);

export type OutgoingMail = typeof outgoingMail.$inferSelect;

// ── The committee: invitations, comments, firm notes, preferences ─────────────────────────────

/**
 * An invitation to join one project's committee. The link carries a random token; only its SHA-256
 * is stored, so the table alone cannot be used to join. Single use: accepting sets acceptedAt.
 */
export const invitations = pgTable(
  "invitations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    name: text("name").notNull(),
    tokenHash: text("token_hash").notNull(),
    invitedById: uuid("invited_by_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp("sent_at", { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    acceptedAt: timestamp("accepted_at", { withTimezone: true }),
    acceptedUserId: uuid("accepted_user_id").references(() => users.id, { onDelete: "set null" }),
    withdrawnAt: timestamp("withdrawn_at", { withTimezone: true }),
  },
  (t) => [
    uniqueIndex("invitations_token_key").on(t.tokenHash),
    index("invitations_project_idx").on(t.projectId),
    check("invitations_email_lowercase", sql`${t.email} = lower(${t.email})`),
  ],
);

/** A comment on a scheme, optionally on one of its stops; read by the firm and the project's committee. */
export const schemeComments = pgTable(
  "scheme_comments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    schemeId: uuid("scheme_id").notNull().references(() => schemes.id, { onDelete: "cascade" }),
    /** The stop's id in the scheme document, and its name and pitch when the comment was made. */
    stopId: text("stop_id"),
    stopLabel: text("stop_label"),
    authorId: uuid("author_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    body: text("body").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("scheme_comments_scheme_idx").on(t.schemeId, t.createdAt)],
);

/** The firm's own notes on a scheme: a table of their own, so no query for comments can reach them. */
export const schemeNotes = pgTable(
  "scheme_notes",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    schemeId: uuid("scheme_id").notNull().references(() => schemes.id, { onDelete: "cascade" }),
    stopId: text("stop_id"),
    stopLabel: text("stop_label"),
    authorId: uuid("author_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    body: text("body").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("scheme_notes_scheme_idx").on(t.schemeId, t.createdAt)],
);

/** Each committee member's one preferred scheme of a project. */
export const schemePreferences = pgTable(
  "scheme_preferences",
  {
    projectId: uuid("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
    userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    schemeId: uuid("scheme_id").notNull().references(() => schemes.id, { onDelete: "cascade" }),
    note: text("note").notNull().default(""),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.projectId, t.userId] })],
);

export type Invitation = typeof invitations.$inferSelect;

// ── The firm's rate book and its quotations ──────────────────────────────────────────────────────

/**
 * A named set of the firm's rates and norms. Every saved change is a new row in rate_set_versions;
 * `version` is the latest, and guards against overwriting a colleague's save. One set is current:
 * schemes are priced against it unless another is chosen.
 */
export const rateSets = pgTable(
  "rate_sets",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    name: text("name").notNull(),
    isCurrent: boolean("is_current").notNull().default(false),
    version: integer("version").notNull().default(1),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("rate_sets_name_key").on(t.name),
    uniqueIndex("rate_sets_one_current").on(t.isCurrent).where(sql`${t.isCurrent}`),
  ],
);

/** One saved state of a rate set: the whole rates object as the estimator's ratesSchema reads it. */
export const rateSetVersions = pgTable(
  "rate_set_versions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    rateSetId: uuid("rate_set_id").notNull().references(() => rateSets.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    effectiveDate: date("effective_date").notNull(),
    rates: jsonb("rates").notNull(),
    note: text("note").notNull().default(""),
    authorId: uuid("author_id").references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("rate_set_versions_version_key").on(t.rateSetId, t.version)],
);

/** Stored states; "lapsed" is read from the validity date of an issued quotation, never stored. */
export const quoteStatuses = ["draft", "issued", "accepted", "declined"] as const;
export const quoteStatusEnum = pgEnum("quote_status", quoteStatuses);

/** The last quotation number given in each year: numbers are handed out in one statement, so two servers never give the same. */
export const quoteCounters = pgTable("quote_counters", {
  year: integer("year").primaryKey(),
  last: integer("last").notNull(),
});

/**
 * A quotation priced from one scheme revision and one rate-set version. When issued it keeps its own
 * snapshot (scheme document, rates, estimate, commercial lines, totals, firm and client details), and
 * its documents are written from that snapshot alone.
 */
export const quotations = pgTable(
  "quotations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    projectId: uuid("project_id").notNull().references(() => projects.id, { onDelete: "cascade" }),
    schemeId: uuid("scheme_id").references(() => schemes.id, { onDelete: "set null" }),
    schemeVersion: integer("scheme_version").notNull(),
    rateSetVersionId: uuid("rate_set_version_id").references(() => rateSetVersions.id, { onDelete: "set null" }),
    number: text("number").notNull(),
    status: quoteStatusEnum("status").notNull().default("draft"),
    version: integer("version").notNull().default(1),
    commercial: jsonb("commercial").notNull(),
    snapshot: jsonb("snapshot"),
    validUntil: date("valid_until"),
    issuedAt: timestamp("issued_at", { withTimezone: true }),
    issuedById: uuid("issued_by_id").references(() => users.id),
    decidedAt: timestamp("decided_at", { withTimezone: true }),
    /** When the tender was sent to the committee; a client sees only tenders sent to them. */
    sentAt: timestamp("sent_at", { withTimezone: true }),
    createdById: uuid("created_by_id").references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("quotations_number_key").on(t.number), index("quotations_project_idx").on(t.projectId)],
);

export type RateSet = typeof rateSets.$inferSelect;
export type RateSetVersion = typeof rateSetVersions.$inferSelect;
export type Quotation = typeof quotations.$inferSelect;
