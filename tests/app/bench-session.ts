/** Signing the demo designer in and reading the seeded LA-47 design's head revision, for bench tests in Chromium. */
import type { Page } from "playwright-core";

export const DESIGNER = { email: "tomas@larkfield.example", password: "bench-demo-2026" };
export const DESIGN_TITLE = "LA-47 studio condenser";

export interface SeededDesign {
  workspaceId: string;
  designId: string;
  circuit: Record<string, unknown>;
}

export async function signIn(page: Page, baseUrl: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel("E-mail").fill(DESIGNER.email);
  await page.getByLabel("Password").fill(DESIGNER.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}

export async function findDesign(page: Page, baseUrl: string): Promise<SeededDesign> {
  const api = page.context().request;
  const { workspaces } = await (await api.get(`${baseUrl}/api/workspaces`)).json();
  const workspaceId = workspaces.find((w: { slug: string }) => w.slug === "larkfield").workspaceId;
  const list = await (await api.get(`${baseUrl}/api/workspaces/${workspaceId}/designs?q=LA-47`)).json();
  const design = list.rows.find((d: { title: string }) => d.title === DESIGN_TITLE);
  const base = `${baseUrl}/api/workspaces/${workspaceId}/designs/${design.id}`;
  const { design: full } = await (await api.get(base)).json();
  const { revision } = await (await api.get(`${base}/revisions/${full.headRevisionId}`)).json();
  return { workspaceId, designId: design.id, circuit: revision.circuit };
}
