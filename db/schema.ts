/**
 * Backplate's tables. Every change goes through a migration generated with `npm run db:generate` (drizzle-kit) and
 * committed under drizzle/. Times are timestamptz; ids are UUIDs made by the database.
 */
import { sql } from "drizzle-orm";
import {
  bigserial,
  boolean,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";

/** The four roles of a workspace membership (see the glossary in DEVELOPERS.md). */
export const roleEnum = pgEnum("role", ["owner", "designer", "reviewer", "viewer"]);

export const designStatusEnum = pgEnum("design_status", ["draft", "in_review", "approved", "rework"]);

const createdAt = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();

/** People. The column names next-auth's adapter reads (name, email, emailVerified, image) keep its meaning. */
export const users = pgTable("users", {
  id: uuid("id").primaryKey().defaultRandom(),
  email: text("email").notNull(),
  name: text("name"),
  /** bcrypt hash; null for people who only sign in by e-mailed link. */
  passwordHash: text("password_hash"),
  emailVerified: timestamp("email_verified", { withTimezone: true, mode: "date" }),
  image: text("image"),
  createdAt: createdAt(),
}, (t) => [uniqueIndex("users_email_lower").on(sql`lower(${t.email})`)]);

/** next-auth's linked sign-in accounts (kept for the adapter; Backplate signs in by password or e-mailed link). */
export const accounts = pgTable("accounts", {
  userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  type: text("type").$type<"email" | "oauth" | "oidc" | "webauthn">().notNull(),
  provider: text("provider").notNull(),
  providerAccountId: text("provider_account_id").notNull(),
  refresh_token: text("refresh_token"),
  access_token: text("access_token"),
  expires_at: integer("expires_at"),
  token_type: text("token_type"),
  scope: text("scope"),
  id_token: text("id_token"),
  session_state: text("session_state"),
}, (t) => [primaryKey({ columns: [t.provider, t.providerAccountId] })]);

/** Database sessions (unused with signed-cookie sessions; present because the adapter expects the table). */
export const sessions = pgTable("sessions", {
  sessionToken: text("session_token").primaryKey(),
  userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  expires: timestamp("expires", { withTimezone: true, mode: "date" }).notNull(),
});

/** One-time tokens of e-mailed sign-in links (next-auth stores them hashed). */
export const verificationTokens = pgTable("verification_tokens", {
  identifier: text("identifier").notNull(),
  token: text("token").notNull(),
  expires: timestamp("expires", { withTimezone: true, mode: "date" }).notNull(),
}, (t) => [primaryKey({ columns: [t.identifier, t.token] })]);

/** Password-reset links: the token is stored as a SHA-256 hash and used once. */
export const passwordResetTokens = pgTable("password_reset_tokens", {
  id: uuid("id").primaryKey().defaultRandom(),
  userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  tokenHash: text("token_hash").notNull().unique(),
  expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
  usedAt: timestamp("used_at", { withTimezone: true }),
  createdAt: createdAt(),
});

/** Fixed-window counters for rate limits (sign-in attempts per e-mail and per address). */
export const rateLimits = pgTable("rate_limits", {
  key: text("key").primaryKey(),
  count: integer("count").notNull(),
  windowStartedAt: timestamp("window_started_at", { withTimezone: true }).notNull(),
});

export const workspaces = pgTable("workspaces", {
  id: uuid("id").primaryKey().defaultRandom(),
  slug: text("slug").notNull().unique(),
  name: text("name").notNull(),
  /** Owners may allow bench links that open without signing in. */
  allowPublicLinks: boolean("allow_public_links").notNull().default(true),
  /** Whether a designer may approve a revision they authored. */
  allowSelfApproval: boolean("allow_self_approval").notNull().default(false),
  createdAt: createdAt(),
});

export const memberships = pgTable("memberships", {
  workspaceId: uuid("workspace_id").notNull().references(() => workspaces.id, { onDelete: "cascade" }),
  userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  role: roleEnum("role").notNull(),
  createdAt: createdAt(),
}, (t) => [primaryKey({ columns: [t.workspaceId, t.userId] }), index("memberships_user").on(t.userId)]);

/** An invitation by e-mail to join a workspace with a role; the token is stored hashed and expires. */
export const invitations = pgTable("invitations", {
  id: uuid("id").primaryKey().defaultRandom(),
  workspaceId: uuid("workspace_id").notNull().references(() => workspaces.id, { onDelete: "cascade" }),
  email: text("email").notNull(),
  role: roleEnum("role").notNull(),
  tokenHash: text("token_hash").notNull().unique(),
  invitedBy: uuid("invited_by").notNull().references(() => users.id),
  expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
  acceptedAt: timestamp("accepted_at", { withTimezone: true }),
  revokedAt: timestamp("revoked_at", { withTimezone: true }),
  createdAt: createdAt(),
}, (t) => [index("invitations_workspace").on(t.workspaceId)]);

export const designs = pgTable("designs", {
  id: uuid("id").primaryKey().defaultRandom(),
  workspaceId: uuid("workspace_id").notNull().references(() => workspaces.id, { onDelete: "cascade" }),
  title: text("title").notNull(),
  description: text("description").notNull().default(""),
  status: designStatusEnum("status").notNull().default("draft"),
  createdBy: uuid("created_by").notNull().references(() => users.id),
  /** The newest revision; a save must name it as its parent or it is refused with 409. */
  headRevisionId: uuid("head_revision_id"),
  /** Set when the design was forked from another (possibly in another workspace). */
  forkedFromDesignId: uuid("forked_from_design_id"),
  forkedFromRevisionId: uuid("forked_from_revision_id"),
  createdAt: createdAt(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  /** Soft delete: the design and its revisions stay, hidden, until restored. */
  deletedAt: timestamp("deleted_at", { withTimezone: true }),
}, (t) => [index("designs_workspace").on(t.workspaceId, t.updatedAt)]);

/** An immutable saved state of a design. Never updated, never deleted on its own. */
export const designRevisions = pgTable("design_revisions", {
  id: uuid("id").primaryKey().defaultRandom(),
  designId: uuid("design_id").notNull().references(() => designs.id, { onDelete: "cascade" }),
  /** 1, 2, 3 … within the design. */
  number: integer("number").notNull(),
  parentId: uuid("parent_id"),
  /** The circuit file (backplate/circuit version 1), validated by the sim/ parser before it is stored. */
  circuit: jsonb("circuit").notNull(),
  /** Canvas positions and notes beside the circuit. */
  layout: jsonb("layout").notNull().default({}),
  message: text("message").notNull(),
  authorId: uuid("author_id").notNull().references(() => users.id),
  createdAt: createdAt(),
}, (t) => [uniqueIndex("design_revisions_number").on(t.designId, t.number)]);

/**
 * A bench link: read-only access to one revision (or to the design's latest when revisionId is null). The token
 * (at least 128 bits) is shown once and stored as a SHA-256 hash.
 */
export const shareLinks = pgTable("share_links", {
  id: uuid("id").primaryKey().defaultRandom(),
  designId: uuid("design_id").notNull().references(() => designs.id, { onDelete: "cascade" }),
  revisionId: uuid("revision_id").references(() => designRevisions.id, { onDelete: "cascade" }),
  tokenHash: text("token_hash").notNull().unique(),
  label: text("label").notNull().default(""),
  /** The view the link opens: plot, variant, destination, frequency range. */
  view: jsonb("view").notNull().default({}),
  /** Whether the link opens without signing in (only where the workspace allows public links). */
  isPublic: boolean("is_public").notNull().default(false),
  createdBy: uuid("created_by").notNull().references(() => users.id),
  expiresAt: timestamp("expires_at", { withTimezone: true }),
  revokedAt: timestamp("revoked_at", { withTimezone: true }),
  accessCount: integer("access_count").notNull().default(0),
  lastAccessedAt: timestamp("last_accessed_at", { withTimezone: true }),
  createdAt: createdAt(),
}, (t) => [index("share_links_design").on(t.designId)]);

export const auditLog = pgTable("audit_log", {
  id: bigserial("id", { mode: "number" }).primaryKey(),
  workspaceId: uuid("workspace_id").notNull().references(() => workspaces.id, { onDelete: "cascade" }),
  actorId: uuid("actor_id").references(() => users.id),
  /** e.g. "design.create", "revision.create", "member.role" */
  action: text("action").notNull(),
  targetType: text("target_type").notNull(),
  targetId: text("target_id").notNull(),
  detail: jsonb("detail").notNull().default({}),
  createdAt: createdAt(),
}, (t) => [index("audit_log_workspace").on(t.workspaceId, t.createdAt)]);

// ——— Reviews, remarks, decisions, notifications (the review issue) ———

export const reviewStatusEnum = pgEnum("review_status", ["open", "approved", "rework", "withdrawn"]);
export const verdictEnum = pgEnum("verdict", ["approve", "rework"]);

/** A request to look at one revision. */
export const reviews = pgTable("reviews", {
  id: uuid("id").primaryKey().defaultRandom(),
  designId: uuid("design_id").notNull().references(() => designs.id, { onDelete: "cascade" }),
  revisionId: uuid("revision_id").notNull().references(() => designRevisions.id, { onDelete: "cascade" }),
  requestedBy: uuid("requested_by").notNull().references(() => users.id),
  message: text("message").notNull().default(""),
  dueAt: timestamp("due_at", { withTimezone: true }),
  status: reviewStatusEnum("status").notNull().default("open"),
  createdAt: createdAt(),
  closedAt: timestamp("closed_at", { withTimezone: true }),
}, (t) => [index("reviews_design").on(t.designId)]);

export const reviewReviewers = pgTable("review_reviewers", {
  reviewId: uuid("review_id").notNull().references(() => reviews.id, { onDelete: "cascade" }),
  userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
}, (t) => [primaryKey({ columns: [t.reviewId, t.userId] })]);

/**
 * A remark on a revision, anchored to a part, a net, a frequency range or a figure:
 * `{ type: "part", part } | { type: "net", net } | { type: "frequency", fromHz, toHz } | { type: "figure", figure }`.
 * Replies point at their thread's first remark.
 */
export const remarks = pgTable("remarks", {
  id: uuid("id").primaryKey().defaultRandom(),
  designId: uuid("design_id").notNull().references(() => designs.id, { onDelete: "cascade" }),
  revisionId: uuid("revision_id").notNull().references(() => designRevisions.id, { onDelete: "cascade" }),
  reviewId: uuid("review_id").references(() => reviews.id, { onDelete: "set null" }),
  parentId: uuid("parent_id"),
  authorId: uuid("author_id").notNull().references(() => users.id),
  body: text("body").notNull(),
  anchor: jsonb("anchor").notNull(),
  resolvedAt: timestamp("resolved_at", { withTimezone: true }),
  resolvedBy: uuid("resolved_by").references(() => users.id),
  createdAt: createdAt(),
}, (t) => [index("remarks_design").on(t.designId, t.createdAt)]);

export const decisions = pgTable("decisions", {
  id: uuid("id").primaryKey().defaultRandom(),
  reviewId: uuid("review_id").notNull().references(() => reviews.id, { onDelete: "cascade" }),
  revisionId: uuid("revision_id").notNull().references(() => designRevisions.id, { onDelete: "cascade" }),
  reviewerId: uuid("reviewer_id").notNull().references(() => users.id),
  verdict: verdictEnum("verdict").notNull(),
  reason: text("reason").notNull(),
  createdAt: createdAt(),
});

/** Figures and target checks of a revision, computed on the server by sim/ when it is saved. */
export const revisionChecks = pgTable("revision_checks", {
  revisionId: uuid("revision_id").primaryKey().references(() => designRevisions.id, { onDelete: "cascade" }),
  /** the contract's `checks` array: [{ figure, variant?, value, min?, max?, pass }] */
  checks: jsonb("checks").notNull().default([]),
  figures: jsonb("figures").notNull().default({}),
  allPass: boolean("all_pass"),
  /** set when the engine could not run the revision (its message) */
  error: text("error"),
  /** set when a reviewer approves it: the revision's record (message, checks) is then locked */
  approvedAt: timestamp("approved_at", { withTimezone: true }),
  computedAt: timestamp("computed_at", { withTimezone: true }).notNull().defaultNow(),
});

export const emailStatusEnum = pgEnum("email_status", ["pending", "sent", "failed", "skipped"]);

/** In-app inbox entries; the e-mail copy is sent (and retried) from the same row. */
export const notifications = pgTable("notifications", {
  id: uuid("id").primaryKey().defaultRandom(),
  userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
  /** e.g. "review.requested", "remark.created", "decision.made" */
  kind: text("kind").notNull(),
  title: text("title").notNull(),
  body: text("body").notNull().default(""),
  link: text("link").notNull(),
  readAt: timestamp("read_at", { withTimezone: true }),
  emailStatus: emailStatusEnum("email_status").notNull().default("pending"),
  emailAttempts: integer("email_attempts").notNull().default(0),
  emailLastError: text("email_last_error"),
  nextAttemptAt: timestamp("next_attempt_at", { withTimezone: true }),
  createdAt: createdAt(),
}, (t) => [index("notifications_user").on(t.userId, t.createdAt), index("notifications_email").on(t.emailStatus)]);

/** Per-person choices of what reaches them by e-mail and in the inbox; absent row = defaults (both on). */
export const notificationPreferences = pgTable("notification_preferences", {
  userId: uuid("user_id").primaryKey().references(() => users.id, { onDelete: "cascade" }),
  emailEnabled: boolean("email_enabled").notNull().default(true),
  /** kind → { email: boolean, inbox: boolean } overrides */
  perKind: jsonb("per_kind").notNull().default({}),
});

// ——— Measurements and attachments (stored through the S3 client) ———

export const measurementKindEnum = pgEnum("measurement_kind", ["frequency_response", "noise_spectrum"]);

/** A measured curve: the original file is in object storage; only the parsed numbers are ever served as data. */
export const measurements = pgTable("measurements", {
  id: uuid("id").primaryKey().defaultRandom(),
  designId: uuid("design_id").notNull().references(() => designs.id, { onDelete: "cascade" }),
  revisionId: uuid("revision_id").references(() => designRevisions.id, { onDelete: "set null" }),
  kind: measurementKindEnum("kind").notNull(),
  name: text("name").notNull(),
  storageKey: text("storage_key").notNull(),
  originalFilename: text("original_filename").notNull(),
  sizeBytes: integer("size_bytes").notNull(),
  /** { frequency: number[], level_db: number[], phase_deg?: number[] } (noise: level in dBV/√Hz or V/√Hz as mapped) */
  data: jsonb("data").notNull(),
  /** how the file's columns were mapped and which units were chosen in the preview */
  mapping: jsonb("mapping").notNull().default({}),
  uploadedBy: uuid("uploaded_by").notNull().references(() => users.id),
  createdAt: createdAt(),
}, (t) => [index("measurements_design").on(t.designId)]);

/** Other files (photos, PDFs, sign-off reports): always downloaded as attachments, never shown inline. */
export const attachments = pgTable("attachments", {
  id: uuid("id").primaryKey().defaultRandom(),
  designId: uuid("design_id").notNull().references(() => designs.id, { onDelete: "cascade" }),
  reviewId: uuid("review_id").references(() => reviews.id, { onDelete: "set null" }),
  storageKey: text("storage_key").notNull(),
  filename: text("filename").notNull(),
  contentType: text("content_type").notNull(),
  sizeBytes: integer("size_bytes").notNull(),
  /** what the photo or PDF shows, as the uploader put it (optional) */
  caption: text("caption"),
  uploadedBy: uuid("uploaded_by").notNull().references(() => users.id),
  createdAt: createdAt(),
}, (t) => [index("attachments_design").on(t.designId)]);
