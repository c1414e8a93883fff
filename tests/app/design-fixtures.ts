/**
 * Shared set-up of the designs app tests: the demo people signed in over HTTP, the demo workspace's id, and a second
 * workspace none of them belongs to (made directly in the run's PostgreSQL) for the "another workspace's ids" cases.
 */
import { randomUUID } from "node:crypto";
import { Pool } from "pg";
import demo from "../../sim/examples/demo-microphone.json";
import { DEMO_PASSWORD } from "../../db/demo-people";
import { type HttpSession, signInWithPassword } from "./http-session";
import { DEMO_WORKSPACE } from "../../db/demo-people";

export const DEMO = {
  owner: "orla@larkfield.example",
  designer: "tomas@larkfield.example",
  reviewer: "margit@larkfield.example",
  viewer: "felix@larkfield.example",
} as const;
export type DemoRole = keyof typeof DEMO;

export const demoCircuit = () => structuredClone(demo) as Record<string, unknown>;

export function withParameter(name: string, value: string): Record<string, unknown> {
  const circuit = demoCircuit() as { parameters: Record<string, string> };
  circuit.parameters[name] = value;
  return circuit;
}

export async function signInAll(baseUrl: string): Promise<Record<DemoRole, HttpSession>> {
  const entries = await Promise.all(
    Object.entries(DEMO).map(async ([role, email]) => {
      const result = await signInWithPassword(baseUrl, email, DEMO_PASSWORD);
      if (!result.ok) throw new Error(`sign-in as ${email} failed: ${result.error}`);
      return [role, result.session] as const;
    }),
  );
  return Object.fromEntries(entries) as Record<DemoRole, HttpSession>;
}

export async function workspaceIdOf(pool: Pool, slug: string): Promise<string> {
  const { rows } = await pool.query("SELECT id FROM workspaces WHERE slug = $1", [slug]);
  return rows[0].id;
}

/** A workspace with one design (and a revision), owned by a person outside the demo. */
export async function foreignWorkspace(pool: Pool): Promise<{ workspaceId: string; designId: string; revisionId: string }> {
  const { rows: [user] } = await pool.query("INSERT INTO users (email, name) VALUES ($1, 'Hollin Outsider') RETURNING id", [`outsider-${randomUUID()}@hollin.example`]);
  const { rows: [ws] } = await pool.query("INSERT INTO workspaces (slug, name) VALUES ($1, 'Hollin Works') RETURNING id", [`hollin-${randomUUID().slice(0, 8)}`]);
  await pool.query("INSERT INTO memberships (workspace_id, user_id, role) VALUES ($1, $2, 'owner')", [ws.id, user.id]);
  const { rows: [design] } = await pool.query("INSERT INTO designs (workspace_id, title, created_by) VALUES ($1, 'Hollin secret', $2) RETURNING id", [ws.id, user.id]);
  const { rows: [revision] } = await pool.query(
    "INSERT INTO design_revisions (design_id, number, circuit, message, author_id) VALUES ($1, 1, $2, 'first', $3) RETURNING id",
    [design.id, JSON.stringify(demo), user.id],
  );
  await pool.query("UPDATE designs SET head_revision_id = $1 WHERE id = $2", [revision.id, design.id]);
  return { workspaceId: ws.id, designId: design.id, revisionId: revision.id };
}

/** A fresh design of the demo circuit in the demo workspace, made by the demo designer over the API. */
export async function createDemoDesign(baseUrl: string, pool: Pool, title: string): Promise<{ workspaceId: string; designId: string; revisionId: string }> {
  const workspaceId = await workspaceIdOf(pool, DEMO_WORKSPACE.slug);
  const designer = await signInWithPassword(baseUrl, DEMO.designer, DEMO_PASSWORD);
  if (!designer.ok) throw new Error(`sign-in as ${DEMO.designer} failed: ${designer.error}`);
  const created = await designer.session.fetch(`/api/workspaces/${workspaceId}/designs`, { method: "POST", body: { title, circuit: demoCircuit() } });
  if (created.status !== 201) throw new Error(`creating “${title}” answered ${created.status}: ${await created.text()}`);
  const body = await created.json();
  return { workspaceId, designId: body.design.id, revisionId: body.revisionId };
}

export { Pool };
