/**
 * People and workspaces for the design tests, made directly in the test run's PostgreSQL with unique e-mails and
 * slugs so test files do not see each other's rows.
 */
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import type { Role } from "@/components/auth/roles";
import { getDb } from "@/db/client";
import { auditLog, memberships, users, workspaces } from "@/db/schema";
import demo from "@/sim/examples/demo-microphone.json";

export const demoCircuit = () => structuredClone(demo) as unknown as Record<string, unknown>;

/** The demo circuit with one value changed (the source resistor), as a designer would save it. */
export function withSourceResistor(value: string): Record<string, unknown> {
  const circuit = demoCircuit() as { parameters: Record<string, string> };
  circuit.parameters.RS = value;
  return circuit as unknown as Record<string, unknown>;
}

export async function makeUser(name: string): Promise<string> {
  const [row] = await getDb()
    .insert(users)
    .values({ email: `${name.toLowerCase().replace(/\W/g, "")}-${randomUUID()}@test.example`, name })
    .returning({ id: users.id });
  return row.id;
}

export async function makeWorkspace(members: Record<string, Role>, allowPublicLinks = true): Promise<string> {
  const [ws] = await getDb()
    .insert(workspaces)
    .values({ slug: `ws-${randomUUID()}`, name: "Test workspace", allowPublicLinks })
    .returning({ id: workspaces.id });
  for (const [userId, role] of Object.entries(members)) {
    await getDb().insert(memberships).values({ workspaceId: ws.id, userId, role });
  }
  return ws.id;
}

export async function auditActions(workspaceId: string): Promise<string[]> {
  const rows = await getDb().select({ action: auditLog.action }).from(auditLog).where(eq(auditLog.workspaceId, workspaceId)).orderBy(auditLog.id);
  return rows.map((r) => r.action);
}
