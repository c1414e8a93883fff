import "server-only";
import { and, desc, eq, lt } from "drizzle-orm";
import { type Database, getDb } from "./client";
import { auditLog, users } from "./schema";

export interface AuditEntry {
  workspaceId: string;
  actorId: string | null;
  /** dotted verb, e.g. "design.create", "revision.create", "member.role", "share.revoke" */
  action: string;
  targetType: string;
  targetId: string;
  detail?: Record<string, unknown>;
}

/** Records who did what to which thing; call it inside the same transaction as the change it records. */
export async function recordAudit(db: Pick<Database, "insert">, entry: AuditEntry): Promise<void> {
  await db.insert(auditLog).values({ ...entry, detail: entry.detail ?? {} });
}

export interface AuditRow {
  id: number;
  action: string;
  targetType: string;
  targetId: string;
  detail: unknown;
  createdAt: Date;
  actorName: string | null;
  actorEmail: string | null;
}

/** Newest first, `limit` rows older than the `before` id (for paging). */
export async function listAudit(workspaceId: string, options: { limit?: number; before?: number } = {}): Promise<AuditRow[]> {
  const limit = Math.min(options.limit ?? 50, 200);
  return getDb()
    .select({
      id: auditLog.id,
      action: auditLog.action,
      targetType: auditLog.targetType,
      targetId: auditLog.targetId,
      detail: auditLog.detail,
      createdAt: auditLog.createdAt,
      actorName: users.name,
      actorEmail: users.email,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorId))
    .where(
      options.before
        ? and(eq(auditLog.workspaceId, workspaceId), lt(auditLog.id, options.before))
        : eq(auditLog.workspaceId, workspaceId),
    )
    .orderBy(desc(auditLog.id))
    .limit(limit);
}
