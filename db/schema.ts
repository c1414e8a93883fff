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

export const users = pgTable("users", {
  id: uuid("id").primaryKey().defaultRandom(),
  email: text("email").notNull(),
  name: text("name").notNull(),
  passwordHash: text("password_hash"),
  emailVerified: timestamp("email_verified", { withTimezone: true }),
  createdAt: createdAt(),
}, (t) => [uniqueIndex("users_email_lower").on(sql`lower(${t.email})`)]);

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

export const designs = pgTable("designs", {
  id: uuid("id").primaryKey().defaultRandom(),
  workspaceId: uuid("workspace_id").notNull().references(() => workspaces.id, { onDelete: "cascade" }),
  title: text("title").notNull(),
  description: text("description").notNull().default(""),
  status: designStatusEnum("status").notNull().default("draft"),
  createdBy: uuid("created_by").notNull().references(() => users.id),
  /** The newest revision; a save must name it as its parent or it is refused with 409. */
  headRevisionId: uuid("head_revision_id"),
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
