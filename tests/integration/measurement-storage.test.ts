/**
 * Measurement uploads against the real storage fake (s3rver through the S3 client) and the test's PostgreSQL:
 * a good file is stored in both places; a bad file, storage being down, or the row failing leave nothing behind.
 */
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { uploadMeasurement } from "@/app/_server/measurement-upload";
import { errorResponse } from "@/app/_server/respond";
import { storeThenRecord } from "@/app/_server/store-then-record";
import { getObject } from "@/app/_server/storage";
import { getDb } from "@/db/client";
import { createDesign } from "@/db/designs";
import { getMeasurement, listMeasurements } from "@/db/measurements";
import { measurements } from "@/db/schema";
import { demoCircuit, makeUser, makeWorkspace } from "./design-fixtures";
import { sweepCsv, testS3 } from "./storage-client";

const mapping = JSON.stringify({ kind: "frequency_response", name: "Rig sweep", frequencyColumn: 0, levelColumn: 1, phaseColumn: null, frequencyUnit: "Hz", levelUnit: "dB" });
const bytes = (text: string) => new TextEncoder().encode(text);

let workspaceId: string;
let designId: string;
let userId: string;
const bucket = testS3();

beforeAll(async () => {
  userId = await makeUser("Tomas Reyne");
  workspaceId = await makeWorkspace({ [userId]: "designer" });
  ({ designId } = await createDesign(workspaceId, userId, { title: "Storage test", circuit: demoCircuit(), message: "Start" }));
});

const rows = async () => (await getDb().select({ id: measurements.id }).from(measurements).where(eq(measurements.designId, designId))).length;
const objects = () => bucket.keys(`designs/${designId}/`);

describe("measurement storage", () => {
  it("stores the original byte for byte and the parsed curve in the table", async () => {
    const { csv, frequency } = sweepCsv(50, 4);
    const result = await uploadMeasurement({ workspaceId, designId, userId, filename: "sweep.csv", bytes: bytes(csv), mappingJson: mapping, revisionId: null });
    expect(result.points).toBe(61);
    const row = await getMeasurement(workspaceId, designId, result.id);
    expect(row.data.frequency).toEqual(frequency);
    const [key] = await objects();
    expect(key).toMatch(/measurements\/.+-sweep\.csv$/);
    // stored uncorrupted (no chunk framing or checksum trailer in the object)
    expect(new TextDecoder().decode(await getObject(key))).toBe(csv);
  });

  it("refuses malformed files with a message and stores nothing", async () => {
    const before = { rows: await rows(), objects: (await objects()).length };
    const cases: [Uint8Array, RegExp][] = [
      [bytes("frequency,level\nlow,loud\nhigh,soft\n"), /No rows of numbers/],
      [bytes("Frequency,Level\n20,1\n30,n/a\n40,3\n"), /Row 2 of the data: the level “n\/a” is not a number/],
      [new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0]), /not a text file/],
    ];
    const oneColumn = bytes("20\n30\n40\n");
    for (const [file, message] of [...cases, [oneColumn, /No rows of numbers/] as [Uint8Array, RegExp]]) {
      const error = await uploadMeasurement({ workspaceId, designId, userId, filename: "bad.csv", bytes: file, mappingJson: mapping, revisionId: null }).catch((e) => e);
      expect(errorResponse(error).status).toBe(422);
      expect(error.message).toMatch(message);
    }
    const wrongColumns = await uploadMeasurement({
      workspaceId, designId, userId, filename: "three.csv", bytes: bytes("20,1\n30,2\n40,3\n"),
      mappingJson: JSON.stringify({ ...JSON.parse(mapping), levelColumn: 2 }), revisionId: null,
    }).catch((e) => e);
    expect(wrongColumns.message).toBe("The level column (3) does not exist: the file has 2 columns.");
    expect({ rows: await rows(), objects: (await objects()).length }).toEqual(before);
  });

  it("answers 503 when storage is down and writes no row", async () => {
    const before = await rows();
    const saved = process.env.S3_ENDPOINT;
    process.env.S3_ENDPOINT = "http://127.0.0.1:9"; // the discard port: nothing listens there
    try {
      const error = await uploadMeasurement({ workspaceId, designId, userId, filename: "sweep.csv", bytes: bytes(sweepCsv(50, 0).csv), mappingJson: mapping, revisionId: null }).catch((e) => e);
      const response = errorResponse(error);
      expect(response.status).toBe(503);
      expect((await response.json()).error.message).toMatch(/File storage is not answering, so nothing was stored/);
    } finally {
      process.env.S3_ENDPOINT = saved;
    }
    expect(await rows()).toBe(before);
  });

  it("deletes the stored object when the row cannot be written", async () => {
    const before = (await objects()).length;
    // a person id that is no user: the foreign key refuses the row after the object is already stored
    const error = await uploadMeasurement({ workspaceId, designId, userId: "00000000-0000-4000-8000-000000000000", filename: "orphan.csv", bytes: bytes(sweepCsv(50, 0).csv), mappingJson: mapping, revisionId: null }).catch((e) => e);
    expect(error).toBeInstanceOf(Error);
    expect((await objects()).length).toBe(before);
    expect((await objects()).some((k) => k.endsWith("orphan.csv"))).toBe(false);
    const direct = await storeThenRecord(`designs/${designId}/attachments/x-undo.txt`, bytes("x"), "text/plain", async () => {
      throw new Error("row refused");
    }).catch((e) => e);
    expect(direct.message).toBe("row refused");
    expect((await objects()).some((k) => k.endsWith("undo.txt"))).toBe(false);
    expect(await listMeasurements(workspaceId, designId)).toHaveLength(1);
  });
});
