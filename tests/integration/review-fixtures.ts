/** A workspace of five people and a demo design for the review tests, made fresh per test. */
import { eq } from "drizzle-orm";
import type { Role } from "@/components/auth/roles";
import { getDb } from "@/db/client";
import { createDesign } from "@/db/designs";
import { getRevision, saveRevision } from "@/db/revisions";
import { designs, users, workspaces } from "@/db/schema";
import { demoCircuit, makeUser, makeWorkspace } from "./design-fixtures";

type Part = { id: string; values: Record<string, unknown> };

/** The demo circuit with one part's value changed and, optionally, targets. */
export function demoWith(change: { part?: string; value?: string; field?: string } = {}, targets?: unknown[]): Record<string, unknown> {
  const circuit = demoCircuit() as { parts: Part[]; targets?: unknown[] };
  if (change.part) {
    const part = circuit.parts.find((p) => p.id === change.part);
    if (!part) throw new Error(`no part ${change.part}`);
    part.values[change.field ?? "capacitance"] = change.value;
  }
  if (targets) circuit.targets = targets;
  return circuit as unknown as Record<string, unknown>;
}

export async function reviewScene(options: { allowSelfApproval?: boolean } = {}) {
  const people = {
    owner: await makeUser("Orrin Owner"),
    designer: await makeUser("Dana Designer"),
    reviewerA: await makeUser("Rhea Reviewer"),
    reviewerB: await makeUser("Bram Reviewer"),
    viewer: await makeUser("Vic Viewer"),
  };
  const roles: Record<string, Role> = {
    [people.owner]: "owner",
    [people.designer]: "designer",
    [people.reviewerA]: "reviewer",
    [people.reviewerB]: "reviewer",
    [people.viewer]: "viewer",
  };
  const workspaceId = await makeWorkspace(roles);
  if (options.allowSelfApproval) await getDb().update(workspaces).set({ allowSelfApproval: true }).where(eq(workspaces.id, workspaceId));
  const [ws] = await getDb().select().from(workspaces).where(eq(workspaces.id, workspaceId));
  const created = await createDesign(workspaceId, people.designer, { title: "Review bench", circuit: demoCircuit() });
  const emails = Object.fromEntries(
    await Promise.all(Object.entries(people).map(async ([k, id]) => [k, (await getDb().select({ email: users.email }).from(users).where(eq(users.id, id)))[0].email])),
  ) as Record<keyof typeof people, string>;
  const home = { workspaceId, slug: ws.slug, allowSelfApproval: ws.allowSelfApproval };
  const actor = (key: keyof typeof people) => ({ id: people[key], name: key });
  const member = (key: keyof typeof people) => ({ ...actor(key), role: roles[people[key]], allowSelfApproval: ws.allowSelfApproval });
  async function save(circuit: Record<string, unknown>, message: string, by: keyof typeof people = "designer") {
    const [design] = await getDb().select({ head: designs.headRevisionId }).from(designs).where(eq(designs.id, created.designId));
    return saveRevision(workspaceId, created.designId, people[by], { parentRevisionId: design.head, circuit, message });
  }
  const status = async () => (await getDb().select({ status: designs.status }).from(designs).where(eq(designs.id, created.designId)))[0].status;
  const revision = (id: string) => getRevision(workspaceId, created.designId, id);
  return { people, emails, workspaceId, home, designId: created.designId, firstRevisionId: created.revisionId, actor, member, save, status, revision };
}
