import "server-only";
/**
 * Measurement rows: the parsed curve (the only thing ever served back as data) and where the original file sits in
 * object storage. Always addressed through the design's workspace, so another workspace's ids find nothing.
 */
import { and, desc, eq } from "drizzle-orm";
import type { MeasuredCurve } from "@/components/measurements/parse-measurement";
import type { MeasurementMapping } from "@/components/schemas/measurement";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { assertId } from "./designs";
import { AppError } from "./errors";
import { designRevisions, designs, measurements, users } from "./schema";

export interface MeasurementSummary {
  id: string;
  name: string;
  kind: MeasurementMapping["kind"];
  revisionId: string | null;
  originalFilename: string;
  sizeBytes: number;
  uploadedByName: string | null;
  createdAt: Date;
}

export interface MeasurementRecord extends MeasurementSummary {
  data: MeasuredCurve;
  mapping: MeasurementMapping;
}

export interface NewMeasurement {
  workspaceId: string;
  designId: string;
  revisionId: string | null;
  storageKey: string;
  originalFilename: string;
  sizeBytes: number;
  curve: MeasuredCurve;
  mapping: MeasurementMapping;
  uploadedBy: string;
}

const summary = {
  id: measurements.id,
  name: measurements.name,
  kind: measurements.kind,
  revisionId: measurements.revisionId,
  originalFilename: measurements.originalFilename,
  sizeBytes: measurements.sizeBytes,
  uploadedByName: users.name,
  createdAt: measurements.createdAt,
};

/** The design must be in the workspace and not deleted; a named revision must be one of its revisions. */
export async function assertMeasurementTarget(workspaceId: string, designId: string, revisionId: string | null): Promise<void> {
  assertId(designId, "design");
  const [design] = await getDb()
    .select({ id: designs.id, deletedAt: designs.deletedAt })
    .from(designs)
    .where(and(eq(designs.id, designId), eq(designs.workspaceId, workspaceId)));
  if (!design || design.deletedAt) throw new AppError("not_found", "No such design in this workspace (it may have been deleted).");
  if (revisionId) {
    assertId(revisionId, "revision");
    const [rev] = await getDb()
      .select({ id: designRevisions.id })
      .from(designRevisions)
      .where(and(eq(designRevisions.id, revisionId), eq(designRevisions.designId, designId)));
    if (!rev) throw new AppError("invalid_input", "That revision is not one of this design's revisions.", { fields: { revisionId: "Choose a revision of this design." } });
  }
}

export async function insertMeasurement(input: NewMeasurement): Promise<{ id: string }> {
  return getDb().transaction(async (tx) => {
    const [row] = await tx
      .insert(measurements)
      .values({
        designId: input.designId,
        revisionId: input.revisionId,
        kind: input.mapping.kind,
        name: input.mapping.name,
        storageKey: input.storageKey,
        originalFilename: input.originalFilename,
        sizeBytes: input.sizeBytes,
        data: input.curve,
        mapping: input.mapping,
        uploadedBy: input.uploadedBy,
      })
      .returning({ id: measurements.id });
    await recordAudit(tx, {
      workspaceId: input.workspaceId,
      actorId: input.uploadedBy,
      action: "measurement.upload",
      targetType: "measurement",
      targetId: row.id,
      detail: { designId: input.designId, name: input.mapping.name, points: input.curve.frequency.length },
    });
    return row;
  });
}

export async function listMeasurements(workspaceId: string, designId: string): Promise<MeasurementSummary[]> {
  assertId(designId, "design");
  const rows = await getDb()
    .select(summary)
    .from(measurements)
    .innerJoin(designs, eq(designs.id, measurements.designId))
    .leftJoin(users, eq(users.id, measurements.uploadedBy))
    .where(and(eq(measurements.designId, designId), eq(designs.workspaceId, workspaceId)))
    .orderBy(desc(measurements.createdAt));
  return rows;
}

export async function getMeasurement(workspaceId: string, designId: string, measurementId: string): Promise<MeasurementRecord> {
  assertId(designId, "design");
  assertId(measurementId, "measurement");
  const [row] = await getDb()
    .select({ ...summary, data: measurements.data, mapping: measurements.mapping })
    .from(measurements)
    .innerJoin(designs, eq(designs.id, measurements.designId))
    .leftJoin(users, eq(users.id, measurements.uploadedBy))
    .where(and(eq(measurements.id, measurementId), eq(measurements.designId, designId), eq(designs.workspaceId, workspaceId)));
  if (!row) throw new AppError("not_found", "No such measurement on this design.");
  return { ...row, data: row.data as MeasuredCurve, mapping: row.mapping as MeasurementMapping };
}

/** Every measurement of a design with its curve (the sign-off report draws them all). */
export async function listMeasurementCurves(workspaceId: string, designId: string): Promise<MeasurementRecord[]> {
  const rows = await getDb()
    .select({ ...summary, data: measurements.data, mapping: measurements.mapping })
    .from(measurements)
    .innerJoin(designs, eq(designs.id, measurements.designId))
    .leftJoin(users, eq(users.id, measurements.uploadedBy))
    .where(and(eq(measurements.designId, designId), eq(designs.workspaceId, workspaceId)))
    .orderBy(desc(measurements.createdAt));
  return rows.map((row) => ({ ...row, data: row.data as MeasuredCurve, mapping: row.mapping as MeasurementMapping }));
}

/** Removes the row (with its audit entry) and returns the storage key, so the caller deletes the object after. */
export async function deleteMeasurement(workspaceId: string, designId: string, measurementId: string, actorId: string): Promise<string> {
  const found = await getMeasurement(workspaceId, designId, measurementId);
  return getDb().transaction(async (tx) => {
    const [row] = await tx.delete(measurements).where(eq(measurements.id, found.id)).returning({ key: measurements.storageKey });
    await recordAudit(tx, { workspaceId, actorId, action: "measurement.delete", targetType: "measurement", targetId: found.id, detail: { designId, name: found.name } });
    return row.key;
  });
}
