import "server-only";
import { and, asc, desc, eq, exists, ilike, isNotNull, isNull, type SQL, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { emptyCircuit } from "@/components/designs/empty-circuit";
import type { CreateDesignInput, DesignStatus, ListDesignsQuery } from "@/components/schemas/design";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { checkCircuit } from "./designs-circuit";
import { AppError } from "./errors";
import { designRevisions, designs, users } from "./schema";

export interface DesignSummary {
  id: string;
  title: string;
  status: DesignStatus;
  createdById: string;
  createdByName: string | null;
  headRevisionId: string | null;
  headNumber: number | null;
  headAuthorName: string | null;
  updatedAt: Date;
  createdAt: Date;
  deletedAt: Date | null;
}

export interface DesignPage {
  rows: DesignSummary[];
  total: number;
  page: number;
  pageSize: number;
}

const creator = alias(users, "creator");
const headAuthor = alias(users, "head_author");
const head = alias(designRevisions, "head");

const summaryColumns = {
  id: designs.id,
  title: designs.title,
  status: designs.status,
  createdById: designs.createdBy,
  createdByName: creator.name,
  headRevisionId: designs.headRevisionId,
  headNumber: head.number,
  headAuthorName: headAuthor.name,
  updatedAt: designs.updatedAt,
  createdAt: designs.createdAt,
  deletedAt: designs.deletedAt,
};

/** The designs list's rows, and its total as a window count (so a page is one round trip). */
function summaryQuery() {
  return getDb()
    .select({ ...summaryColumns, total: sql<number>`count(*) over ()`.mapWith(Number) })
    .from(designs)
    .innerJoin(creator, eq(creator.id, designs.createdBy))
    .leftJoin(head, eq(head.id, designs.headRevisionId))
    .leftJoin(headAuthor, eq(headAuthor.id, head.authorId));
}

const SORT_COLUMNS = {
  updated: designs.updatedAt,
  created: designs.createdAt,
  title: designs.title,
  status: designs.status,
} as const;

/** Escapes LIKE's wildcards so a search for "50%" finds the text "50%". */
const likePattern = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Ids arrive from URLs; one that is not even a UUID names nothing (and must not reach PostgreSQL as one). */
export function assertId(id: string, what: string): void {
  if (!UUID.test(id)) throw new AppError("not_found", `No such ${what}: "${id.slice(0, 60)}" is not an id Backplate made.`);
}

/** A workspace's designs: search in titles, filter by status and by a person who saved a revision, sorted, paged. */
export async function listDesigns(workspaceId: string, query: ListDesignsQuery): Promise<DesignPage> {
  const where: SQL[] = [eq(designs.workspaceId, workspaceId)];
  where.push(query.show === "deleted" ? isNotNull(designs.deletedAt) : isNull(designs.deletedAt));
  if (query.q) where.push(ilike(designs.title, likePattern(query.q)));
  if (query.status) where.push(eq(designs.status, query.status));
  if (query.author) {
    where.push(
      exists(
        getDb()
          .select({ one: sql`1` })
          .from(designRevisions)
          .where(and(eq(designRevisions.designId, designs.id), eq(designRevisions.authorId, query.author))),
      ),
    );
  }
  const condition = and(...where);
  const order = query.dir === "asc" ? asc : desc;
  const found = await summaryQuery()
    .where(condition)
    .orderBy(order(SORT_COLUMNS[query.sort]), asc(designs.id))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  // only a page past the end has no row to carry the total
  const total =
    found.length > 0 ? found[0].total : (await getDb().select({ total: sql<number>`count(*)::int` }).from(designs).where(condition))[0].total;
  const rows = found.map(({ total: _, ...row }) => row);
  return { rows, total, page: query.page, pageSize: query.pageSize };
}

/** People who saved at least one revision in the workspace (the table's author filter). */
export async function listDesignAuthors(workspaceId: string): Promise<{ id: string; name: string | null }[]> {
  return getDb()
    .selectDistinct({ id: users.id, name: users.name })
    .from(designRevisions)
    .innerJoin(designs, eq(designs.id, designRevisions.designId))
    .innerJoin(users, eq(users.id, designRevisions.authorId))
    .where(and(eq(designs.workspaceId, workspaceId), isNull(designs.deletedAt)))
    .orderBy(asc(users.name));
}

/** One design of a workspace; a deleted one only when asked. Unknown ids and other workspaces' ids are 404. */
export async function getDesign(
  workspaceId: string,
  designId: string,
  options: { includeDeleted?: boolean } = {},
): Promise<DesignSummary & { description: string; forkedFromDesignId: string | null }> {
  assertId(designId, "design");
  const rows = await getDb()
    .select({ ...summaryColumns, description: designs.description, forkedFromDesignId: designs.forkedFromDesignId })
    .from(designs)
    .innerJoin(creator, eq(creator.id, designs.createdBy))
    .leftJoin(head, eq(head.id, designs.headRevisionId))
    .leftJoin(headAuthor, eq(headAuthor.id, head.authorId))
    .where(and(eq(designs.workspaceId, workspaceId), eq(designs.id, designId)))
    .limit(1);
  const row = rows[0];
  if (!row || (row.deletedAt && !options.includeDeleted)) {
    throw new AppError("not_found", "No such design in this workspace (it may have been deleted).");
  }
  return row;
}

type Tx = Parameters<Parameters<ReturnType<typeof getDb>["transaction"]>[0]>[0];

/** Inserts a design with its first revision inside `tx` and points the head at it. */
export async function insertDesignWithRevision(
  tx: Tx,
  values: {
    workspaceId: string;
    title: string;
    description?: string;
    status?: DesignStatus;
    createdBy: string;
    circuit: Record<string, unknown>;
    layout?: Record<string, unknown>;
    message: string;
    forkedFromDesignId?: string;
    forkedFromRevisionId?: string;
  },
): Promise<{ designId: string; revisionId: string }> {
  const [design] = await tx
    .insert(designs)
    .values({
      workspaceId: values.workspaceId,
      title: values.title,
      description: values.description ?? "",
      status: values.status ?? "draft",
      createdBy: values.createdBy,
      forkedFromDesignId: values.forkedFromDesignId,
      forkedFromRevisionId: values.forkedFromRevisionId,
    })
    .returning({ id: designs.id });
  const [revision] = await tx
    .insert(designRevisions)
    .values({ designId: design.id, number: 1, circuit: values.circuit, layout: values.layout ?? {}, message: values.message, authorId: values.createdBy })
    .returning({ id: designRevisions.id });
  await tx.update(designs).set({ headRevisionId: revision.id }).where(eq(designs.id, design.id));
  return { designId: design.id, revisionId: revision.id };
}

/** A new design from an uploaded or pasted circuit file, or from the empty starting circuit. */
export async function createDesign(
  workspaceId: string,
  actorId: string,
  input: CreateDesignInput,
): Promise<{ designId: string; revisionId: string }> {
  const circuit = checkCircuit(input.circuit ?? emptyCircuit(input.title.trim()));
  const message = input.message?.trim() || (input.circuit ? "Imported circuit file" : "Started from an empty circuit");
  return getDb().transaction(async (tx) => {
    const created = await insertDesignWithRevision(tx, {
      workspaceId,
      title: input.title.trim(),
      description: input.description?.trim() ?? "",
      createdBy: actorId,
      circuit,
      layout: input.layout,
      message,
    });
    await recordAudit(tx, {
      workspaceId,
      actorId,
      action: "design.create",
      targetType: "design",
      targetId: created.designId,
      detail: { title: input.title.trim() },
    });
    await recordAudit(tx, {
      workspaceId,
      actorId,
      action: "revision.create",
      targetType: "revision",
      targetId: created.revisionId,
      detail: { designId: created.designId, number: 1, message },
    });
    return created;
  });
}

/** Locks a live design row of the workspace for the rest of `tx`, or 404. */
export async function lockDesign(tx: Tx, workspaceId: string, designId: string, options: { deleted?: boolean } = {}) {
  assertId(designId, "design");
  const rows = await tx
    .select({ id: designs.id, title: designs.title, headRevisionId: designs.headRevisionId, deletedAt: designs.deletedAt })
    .from(designs)
    .where(and(eq(designs.workspaceId, workspaceId), eq(designs.id, designId)))
    .for("update");
  const row = rows[0];
  const wantDeleted = options.deleted ?? false;
  if (!row || Boolean(row.deletedAt) !== wantDeleted) {
    throw new AppError(
      "not_found",
      wantDeleted ? "No deleted design with this id in this workspace." : "No such design in this workspace (it may have been deleted).",
    );
  }
  return row;
}

export async function renameDesign(workspaceId: string, designId: string, actorId: string, title: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    const row = await lockDesign(tx, workspaceId, designId);
    await tx.update(designs).set({ title, updatedAt: new Date() }).where(eq(designs.id, designId));
    await recordAudit(tx, {
      workspaceId,
      actorId,
      action: "design.rename",
      targetType: "design",
      targetId: designId,
      detail: { from: row.title, to: title },
    });
  });
}

/** Soft delete: the design and its revisions stay in the database, hidden from the table, until restored. */
export async function deleteDesign(workspaceId: string, designId: string, actorId: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    const row = await lockDesign(tx, workspaceId, designId);
    await tx.update(designs).set({ deletedAt: new Date() }).where(eq(designs.id, designId));
    await recordAudit(tx, { workspaceId, actorId, action: "design.delete", targetType: "design", targetId: designId, detail: { title: row.title } });
  });
}

export async function restoreDesign(workspaceId: string, designId: string, actorId: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    const row = await lockDesign(tx, workspaceId, designId, { deleted: true });
    await tx.update(designs).set({ deletedAt: null, updatedAt: new Date() }).where(eq(designs.id, designId));
    await recordAudit(tx, { workspaceId, actorId, action: "design.restore", targetType: "design", targetId: designId, detail: { title: row.title } });
  });
}
