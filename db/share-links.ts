import "server-only";
import { createHash, randomBytes, timingSafeEqual } from "node:crypto";
import { and, desc, eq, sql } from "drizzle-orm";
import type { BenchView, CreateBenchLinkInput } from "@/components/schemas/design-bench-link";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { assertId, getDesign } from "./designs";
import { AppError } from "./errors";
import { getRevision } from "./revisions";
import { designRevisions, designs, shareLinks, users, workspaces } from "./schema";

/** 32 random bytes: 256 bits, far above the 128 a guess must beat. */
const TOKEN_BYTES = 32;

export const newShareToken = () => randomBytes(TOKEN_BYTES).toString("base64url");
export const hashShareToken = (token: string) => createHash("sha256").update(token, "utf8").digest("hex");

export interface ShareLinkSummary {
  id: string;
  designId: string;
  revisionId: string | null;
  revisionNumber: number | null;
  label: string;
  view: BenchView;
  isPublic: boolean;
  createdByName: string | null;
  expiresAt: Date | null;
  revokedAt: Date | null;
  accessCount: number;
  lastAccessedAt: Date | null;
  createdAt: Date;
}

const summaryColumns = {
  id: shareLinks.id,
  designId: shareLinks.designId,
  revisionId: shareLinks.revisionId,
  revisionNumber: designRevisions.number,
  label: shareLinks.label,
  view: shareLinks.view,
  isPublic: shareLinks.isPublic,
  createdByName: users.name,
  expiresAt: shareLinks.expiresAt,
  revokedAt: shareLinks.revokedAt,
  accessCount: shareLinks.accessCount,
  lastAccessedAt: shareLinks.lastAccessedAt,
  createdAt: shareLinks.createdAt,
};

/** A view may only name a variant the circuit has, so the link never opens on an engine error. */
function checkViewVariant(circuit: Record<string, unknown>, variant: string | undefined): void {
  if (!variant) return;
  const names = (Array.isArray(circuit.variants) ? circuit.variants : []).map((v: { name?: unknown }) => String(v?.name ?? ""));
  if (!names.includes(variant)) {
    const known = names.length ? `Its variants are ${names.map((n) => `“${n}”`).join(", ")}.` : "It has no variants.";
    throw new AppError("invalid_input", `The revision has no variant “${variant}”. ${known}`, { fields: { "view.variant": "No such variant." } });
  }
}

/** Creates a bench link; the token is returned this once and only its hash is stored. */
export async function createShareLink(
  workspaceId: string,
  designId: string,
  actorId: string,
  input: CreateBenchLinkInput & { view: BenchView },
): Promise<{ token: string; link: ShareLinkSummary }> {
  const design = await getDesign(workspaceId, designId);
  const revision = await getRevision(workspaceId, designId, input.revisionId ?? design.headRevisionId ?? "");
  checkViewVariant(revision.circuit, input.view.variant);
  const token = newShareToken();
  const id = await getDb().transaction(async (tx) => {
    const [row] = await tx
      .insert(shareLinks)
      .values({
        designId,
        revisionId: input.revisionId ?? null,
        tokenHash: hashShareToken(token),
        label: input.label?.trim() ?? "",
        view: input.view,
        isPublic: input.isPublic ?? false,
        createdBy: actorId,
        expiresAt: input.expiresAt ? new Date(input.expiresAt) : null,
      })
      .returning({ id: shareLinks.id });
    await recordAudit(tx, {
      workspaceId,
      actorId,
      action: "share.create",
      targetType: "share_link",
      targetId: row.id,
      detail: { designId, revisionId: input.revisionId ?? null, isPublic: input.isPublic ?? false, expiresAt: input.expiresAt ?? null },
    });
    return row.id;
  });
  const [link] = (await listShareLinks(workspaceId, designId)).filter((l) => l.id === id);
  return { token, link };
}

export async function listShareLinks(workspaceId: string, designId: string): Promise<ShareLinkSummary[]> {
  await getDesign(workspaceId, designId);
  const rows = await getDb()
    .select(summaryColumns)
    .from(shareLinks)
    .innerJoin(users, eq(users.id, shareLinks.createdBy))
    .leftJoin(designRevisions, eq(designRevisions.id, shareLinks.revisionId))
    .where(eq(shareLinks.designId, designId))
    .orderBy(desc(shareLinks.createdAt));
  return rows as ShareLinkSummary[];
}

/** Revokes a link of a design of the workspace; revoking twice is refused so the audit trail stays honest. */
export async function revokeShareLink(workspaceId: string, designId: string, linkId: string, actorId: string): Promise<void> {
  await getDesign(workspaceId, designId);
  assertId(linkId, "bench link");
  await getDb().transaction(async (tx) => {
    const rows = await tx
      .update(shareLinks)
      .set({ revokedAt: new Date() })
      .where(and(eq(shareLinks.id, linkId), eq(shareLinks.designId, designId), sql`${shareLinks.revokedAt} IS NULL`))
      .returning({ id: shareLinks.id });
    if (rows.length === 0) throw new AppError("not_found", "No such live bench link on this design (it may be revoked already).");
    await recordAudit(tx, { workspaceId, actorId, action: "share.revoke", targetType: "share_link", targetId: linkId, detail: { designId } });
  });
}

export interface OpenedShareLink {
  linkId: string;
  workspaceId: string;
  workspaceSlug: string;
  workspaceName: string;
  /** false when the link is not public or the workspace no longer allows public links: sign-in and membership needed */
  opensWithoutSignIn: boolean;
  designId: string;
  designTitle: string;
  /** null: the link follows the design's latest revision */
  pinnedRevisionId: string | null;
  revisionId: string;
  view: BenchView;
  accessCount: number;
  expiresAt: Date | null;
}

/**
 * Finds a link by its token. The lookup is by hash (an index hit, no scan); the stored hash is then compared with
 * timingSafeEqual so the comparison leaks nothing through timing. Revoked, expired or deleted-design links are 410
 * with the reason; unknown tokens are 404.
 */
export async function findShareLink(token: string): Promise<OpenedShareLink> {
  const hash = hashShareToken(token);
  const rows = await getDb()
    .select({
      link: shareLinks,
      workspaceSlug: workspaces.slug,
      workspaceName: workspaces.name,
      workspaceId: workspaces.id,
      allowPublicLinks: workspaces.allowPublicLinks,
      designTitle: designs.title,
      designDeletedAt: designs.deletedAt,
      headRevisionId: designs.headRevisionId,
    })
    .from(shareLinks)
    .innerJoin(designs, eq(designs.id, shareLinks.designId))
    .innerJoin(workspaces, eq(workspaces.id, designs.workspaceId))
    .where(eq(shareLinks.tokenHash, hash))
    .limit(1);
  const row = rows[0];
  const matches = row && timingSafeEqual(Buffer.from(row.link.tokenHash, "hex"), Buffer.from(hash, "hex"));
  if (!row || !matches) throw new AppError("not_found", "This bench link does not exist. Check that the whole link was copied.");
  if (row.link.revokedAt) {
    throw new AppError("gone", "This bench link was revoked by the design's team. Ask them for a new one.", { detail: { reason: "revoked" } });
  }
  if (row.link.expiresAt && row.link.expiresAt.getTime() <= Date.now()) {
    throw new AppError("gone", `This bench link expired on ${row.link.expiresAt.toISOString()}. Ask the design's team for a new one.`, {
      detail: { reason: "expired" },
    });
  }
  if (row.designDeletedAt) {
    throw new AppError("gone", "The design behind this bench link was deleted.", { detail: { reason: "deleted" } });
  }
  const revisionId = row.link.revisionId ?? row.headRevisionId;
  if (!revisionId) throw new AppError("gone", "The design behind this bench link has no saved revision.", { detail: { reason: "empty" } });
  return {
    linkId: row.link.id,
    workspaceId: row.workspaceId,
    workspaceSlug: row.workspaceSlug,
    workspaceName: row.workspaceName,
    opensWithoutSignIn: row.link.isPublic && row.allowPublicLinks,
    designId: row.link.designId,
    designTitle: row.designTitle,
    pinnedRevisionId: row.link.revisionId,
    revisionId,
    view: row.link.view as BenchView,
    accessCount: row.link.accessCount,
    expiresAt: row.link.expiresAt,
  };
}

/** Counts one opening of the link (atomically, so parallel openings are all counted). */
export async function recordShareAccess(linkId: string): Promise<number> {
  const [row] = await getDb()
    .update(shareLinks)
    .set({ accessCount: sql`${shareLinks.accessCount} + 1`, lastAccessedAt: new Date() })
    .where(eq(shareLinks.id, linkId))
    .returning({ accessCount: shareLinks.accessCount });
  return row?.accessCount ?? 0;
}
