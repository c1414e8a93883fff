/**
 * The demo designs at Larkfield Acoustics: built from the invented example circuits in sim/examples, each with a few
 * revisions by the demo designers where a value changes (invented values on generic topologies), in different
 * statuses, one of them soft-deleted. Idempotent: a design that exists (by workspace and title) is left as it is.
 * Runs from scripts (no "server-only" modules), so it checks each circuit with the engine itself before storing it.
 */
import { and, eq } from "drizzle-orm";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import { checkTopology, elaborate } from "../sim";
import benchRc from "../sim/examples/bench-rc-divider.json";
import demoMicrophone from "../sim/examples/demo-microphone.json";
import electret from "../sim/examples/electret-jfet.json";
import triodeFollower from "../sim/examples/triode-emitter-follower.json";
import valveTransformer from "../sim/examples/valve-transformer.json";
import { auditLog, designRevisions, designs, users } from "./schema";

type Circuit = Record<string, unknown> & { parameters: Record<string, string> };
type Status = "draft" | "in_review" | "approved" | "rework";

interface DemoStep {
  by: string;
  message: string;
  /** parameter overrides on top of the previous step's circuit */
  parameters?: Record<string, string>;
  /** minutes after the design's first revision */
  at: number;
}

interface DemoDesign {
  title: string;
  description: string;
  status: Status;
  base: unknown;
  steps: DemoStep[];
  deleted?: boolean;
}

const TOMAS = "tomas@larkfield.example";
const INES = "ines@larkfield.example";

export const DEMO_DESIGNS: DemoDesign[] = [
  {
    title: "LA-47 studio condenser",
    description: "Externally polarised capsule into an n-JFET source follower, 5 m of cable into a console input.",
    status: "in_review",
    base: demoMicrophone,
    steps: [
      { by: TOMAS, message: "First cut from the bench example", at: 0 },
      { by: TOMAS, message: "Source resistor 4k7 → 3k9 for a little more current", parameters: { RS: "3k9" }, at: 90 },
      { by: INES, message: "Polarisation 60 V → 64 V", parameters: { VPOL: "64" }, at: 240 },
      { by: INES, message: "Bias resistors 1G → 2G2 for a lower corner", parameters: { RB: "2G2" }, at: 1500 },
    ],
  },
  {
    title: "EC-6 electret plug-in",
    description: "Electret capsule with its built-in JFET on plug-in power.",
    status: "approved",
    base: electret,
    steps: [
      { by: INES, message: "Plug-in power front end", at: 0 },
      { by: INES, message: "Drain resistor 2k2 → 3k3", parameters: { RDRAIN: "3k3" }, at: 60 },
      { by: TOMAS, message: "Supply 5 V → 4.5 V to match the recorder", parameters: { VSUP: "4.5" }, at: 200 },
    ],
  },
  {
    title: "VT-2 valve microphone",
    description: "Triode impedance converter with an output transformer.",
    status: "rework",
    base: valveTransformer,
    steps: [
      { by: TOMAS, message: "Valve front end with 5:1 transformer", at: 0 },
      { by: TOMAS, message: "Transformer ratio 0.2 → 0.25", parameters: { RATIO: "0.25" }, at: 45 },
      { by: INES, message: "HT 120 V → 130 V", parameters: { HT: "130" }, at: 300 },
    ],
  },
  {
    title: "VF-3 triode follower",
    description: "Triode stage with a bipolar emitter follower.",
    status: "draft",
    base: triodeFollower,
    steps: [
      { by: INES, message: "Triode and emitter follower", at: 0 },
      { by: INES, message: "Emitter resistor 22k → 18k", parameters: { RE: "18k" }, at: 30 },
    ],
  },
  {
    title: "Bench RC check (retired)",
    description: "A bench file kept for checking the filter stage; retired.",
    status: "draft",
    base: benchRc,
    deleted: true,
    steps: [
      { by: TOMAS, message: "RC low-pass and buffer", at: 0 },
      { by: TOMAS, message: "Filter resistor 10k → 12k", parameters: { RF: "12k" }, at: 20 },
    ],
  },
];

/** The circuits of a demo design's revisions, in order, each checked by the engine. */
export function demoRevisionCircuits(design: DemoDesign): Circuit[] {
  const circuits: Circuit[] = [];
  let current = structuredClone(design.base) as Circuit;
  for (const step of design.steps) {
    current = structuredClone(current);
    current.parameters = { ...current.parameters, ...step.parameters };
    checkTopology(elaborate(current));
    circuits.push(current);
  }
  return circuits;
}

/** One day before the seed runs: the demo history looks recent without lying in the future. */
const HISTORY_START_MS = 26 * 60 * 60 * 1000;

// biome-ignore lint/suspicious/noExplicitAny: the seed's drizzle handle is created without the schema generic
type SeedDb = NodePgDatabase<any>;

export async function seedDesigns(db: SeedDb, workspaceId: string): Promise<void> {
  const people = new Map<string, string>();
  for (const email of [TOMAS, INES]) {
    const [row] = await db.select({ id: users.id }).from(users).where(eq(users.email, email));
    if (row) people.set(email, row.id);
  }
  const start = Date.now() - HISTORY_START_MS;
  for (const demo of DEMO_DESIGNS) {
    const existing = await db
      .select({ id: designs.id })
      .from(designs)
      .where(and(eq(designs.workspaceId, workspaceId), eq(designs.title, demo.title)));
    if (existing.length > 0) continue;
    const circuits = demoRevisionCircuits(demo);
    const author = (email: string) => {
      const id = people.get(email);
      if (!id) throw new Error(`The demo person ${email} is missing; seed the people first.`);
      return id;
    };
    await db.transaction(async (tx) => {
      const createdAt = new Date(start);
      const [design] = await tx
        .insert(designs)
        .values({ workspaceId, title: demo.title, description: demo.description, status: demo.status, createdBy: author(demo.steps[0].by), createdAt })
        .returning({ id: designs.id });
      await tx.insert(auditLog).values({
        workspaceId,
        actorId: author(demo.steps[0].by),
        action: "design.create",
        targetType: "design",
        targetId: design.id,
        detail: { title: demo.title },
        createdAt,
      });
      let parentId: string | null = null;
      let last = createdAt;
      for (const [i, step] of demo.steps.entries()) {
        last = new Date(start + step.at * 60_000);
        const [revision]: { id: string }[] = await tx
          .insert(designRevisions)
          .values({ designId: design.id, number: i + 1, parentId, circuit: circuits[i], message: step.message, authorId: author(step.by), createdAt: last })
          .returning({ id: designRevisions.id });
        await tx.insert(auditLog).values({
          workspaceId,
          actorId: author(step.by),
          action: "revision.create",
          targetType: "revision",
          targetId: revision.id,
          detail: { designId: design.id, number: i + 1, message: step.message },
          createdAt: last,
        });
        parentId = revision.id;
      }
      await tx
        .update(designs)
        .set({ headRevisionId: parentId, updatedAt: last, deletedAt: demo.deleted ? new Date(last.getTime() + 60_000) : null })
        .where(eq(designs.id, design.id));
    });
  }
}
