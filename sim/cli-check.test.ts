/**
 * The headless command's `--check` (contract: "The headless command"): the document gains `checks` when the file has
 * targets; with --check the exit status is 1 when any target fails and 0 when all pass. The demo microphone's own
 * figures (printed by the command without targets) set the limits, so each case is on one side of a real value.
 */
import { spawn } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

const TSX = path.resolve("node_modules/.bin/tsx");
const CLI = path.resolve("sim/cli.ts");
const dir = mkdtempSync(path.join(tmpdir(), "backplate-check-"));
const CLI_TIMEOUT_MS = 180_000;

function cli(...args: string[]): Promise<{ status: number | null; document: Record<string, unknown> }> {
  return new Promise((resolve, reject) => {
    const child = spawn(TSX, [CLI, ...args], { stdio: ["ignore", "pipe", "pipe"] });
    let stdout = "";
    child.stdout.on("data", (chunk) => {
      stdout += chunk;
    });
    child.on("error", reject);
    child.on("close", (status) => resolve({ status, document: JSON.parse(stdout) }));
  });
}

const demo = JSON.parse(readFileSync("sim/examples/demo-microphone.json", "utf8"));
let figures: Record<string, number>;
let padFigures: Record<string, number>;

function fileWith(targets: unknown[]): string {
  const file = path.join(dir, `targets-${Math.random().toString(36).slice(2)}.json`);
  writeFileSync(file, JSON.stringify({ ...demo, targets }));
  return file;
}

beforeAll(async () => {
  const [base, pad] = await Promise.all([
    cli("sim/examples/demo-microphone.json"),
    cli("sim/examples/demo-microphone.json", "--variant", "pad"),
  ]);
  figures = base.document.figures as Record<string, number>;
  padFigures = pad.document.figures as Record<string, number>;
  expect(base.document.checks).toBeUndefined();
}, CLI_TIMEOUT_MS);

afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("sim --check", () => {
  it(
    "exits 0 and prints passing checks when every target is met",
    async () => {
      const file = fileWith([
        { figure: "low_corner_hz", max: figures.low_corner_hz * 1.1 },
        { figure: "sensitivity_db_re_1v_per_pa", min: padFigures.sensitivity_db_re_1v_per_pa - 1, variant: "pad" },
      ]);
      const run = await cli(file, "--check");
      expect(run.status).toBe(0);
      expect(run.document.checks).toEqual([
        { figure: "low_corner_hz", value: figures.low_corner_hz, max: figures.low_corner_hz * 1.1, pass: true },
        {
          figure: "sensitivity_db_re_1v_per_pa",
          variant: "pad",
          value: padFigures.sensitivity_db_re_1v_per_pa,
          min: padFigures.sensitivity_db_re_1v_per_pa - 1,
          pass: true,
        },
      ]);
    },
    CLI_TIMEOUT_MS,
  );

  it(
    "exits 1 on a failed target with --check, 0 without it, and fails a figure that is null",
    async () => {
      const file = fileWith([
        { figure: "low_corner_hz", max: figures.low_corner_hz * 0.9 },
        { figure: "max_spl_db", min: 120 },
      ]);
      const [checked, plain] = await Promise.all([cli(file, "--check"), cli(file)]);
      expect(checked.status).toBe(1);
      expect(plain.status).toBe(0);
      const checks = checked.document.checks as { pass: boolean; value: unknown }[];
      expect(checks.map((c) => c.pass)).toEqual([false, false]);
      expect(checks[1].value).toBeNull();
      expect(checked.document.figures).toBeDefined();
    },
    CLI_TIMEOUT_MS,
  );

  it(
    "refuses a target for a variant the file does not have, with exit 2",
    async () => {
      const run = await cli(fileWith([{ figure: "low_corner_hz", max: 20, variant: "louder" }]), "--check");
      expect(run.status).toBe(2);
      expect((run.document.error as { message: string }).message).toContain('no variant "louder"');
    },
    CLI_TIMEOUT_MS,
  );
});
