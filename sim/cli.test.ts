import { spawn } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { followerFile, type TestPart } from "./circuit/test-files";

const TSX = path.resolve("node_modules/.bin/tsx");
const CLI = path.resolve("sim/cli.ts");
const dir = mkdtempSync(path.join(tmpdir(), "backplate-cli-"));
/** Each run starts tsx and loads mathjs; on a busy two-core machine that takes seconds. */
const CLI_TIMEOUT_MS = 180_000;

interface Run {
  status: number | null;
  stdout: string;
  stderr: string;
}

function cli(...args: string[]): Promise<Run> {
  return new Promise((resolve, reject) => {
    const child = spawn(TSX, [CLI, ...args], { stdio: ["ignore", "pipe", "pipe"] });
    let stdout = "";
    let stderr = "";
    child.stdout.on("data", (chunk) => {
      stdout += chunk;
    });
    child.stderr.on("data", (chunk) => {
      stderr += chunk;
    });
    child.on("error", reject);
    child.on("close", (status) => resolve({ status, stdout, stderr }));
  });
}

let fileCount = 0;
function write(content: unknown): string {
  fileCount += 1;
  const file = path.join(dir, `circuit-${fileCount}.json`);
  writeFileSync(file, typeof content === "string" ? content : JSON.stringify(content, null, 2));
  return file;
}

function withParts(edit: (parts: TestPart[]) => TestPart[], overrides: Record<string, unknown> = {}) {
  const file = followerFile(overrides);
  return { ...file, parts: edit(structuredClone(file.parts as TestPart[])) };
}

/** Runs the command on a bad file and returns the error object, checking the exit status and the clean output. */
async function errorOf(...args: string[]) {
  const run = await cli(...args);
  expect(run.status).toBe(2);
  expect(run.stderr).not.toMatch(/\bat .*\.ts:\d+/); // no stack trace
  const document = JSON.parse(run.stdout);
  expect(Object.keys(document)).toEqual(["error"]);
  return document.error as { code: string; message: string; part?: string; net?: string };
}

afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("the headless command", { timeout: CLI_TIMEOUT_MS }, () => {
  it("prints one JSON document for the demo microphone", async () => {
    const run = await cli("sim/examples/demo-microphone.json");
    expect(run.status).toBe(0);
    const document = JSON.parse(run.stdout);
    // the demo file asks for op, ac and noise (contract: keys of analyses that did not run are absent)
    expect(Object.keys(document)).toEqual(["op", "ac", "noise", "figures"]);
    expect(typeof document.figures.self_noise_dba_spl).toBe("number");
    expect(document.op.parts.J1.region).toBe("saturation");
    expect(document.ac.frequency[0]).toBe(1);
    expect(document.ac.frequency.at(-1)).toBe(100_000);
    expect(run.stdout).not.toMatch(/NaN|Infinity/);
  });

  it("applies --variant", async () => {
    const [base, hot] = await Promise.all([
      cli("sim/examples/demo-microphone.json"),
      cli("sim/examples/demo-microphone.json", "--variant", "hotter bias"),
    ]);
    expect(JSON.parse(hot.stdout).op.nets.pol).toBe(80);
    expect(JSON.parse(base.stdout).op.nets.pol).toBe(60);
  });

  it("prints the sweep of a file that asks for one", async () => {
    const run = await cli("sim/examples/bench-rc-divider.json");
    expect(run.status).toBe(0);
    expect(JSON.parse(run.stdout).sweep.map((p: { value: number }) => p.value)).toEqual([4700, 10_000, 22_000]);
  });

  it("prints usage for --help", async () => {
    const run = await cli("--help");
    expect(run.status).toBe(0);
    expect(run.stdout).toMatch(/^Usage: npm run --silent sim -- FILE\.json \[--variant NAME\]/);
  });

  it("rejects a missing file argument, an unknown flag and an unreadable file", async () => {
    const [missing, unknown, unreadable] = await Promise.all([
      errorOf(),
      errorOf("sim/examples/demo-microphone.json", "--gate"),
      errorOf(path.join(dir, "does-not-exist.json")),
    ]);
    expect(missing.code).toBe("invalid_arguments");
    expect(unknown.code).toBe("invalid_arguments");
    expect(unknown.message).toContain("Unknown option --gate");
    expect(unreadable.code).toBe("unreadable_file");
  });

  it("reports malformed JSON with its line and column", async () => {
    const error = await errorOf(write('{\n  "format": "backplate/circuit",\n  "version": 1,,\n}'));
    expect(error.code).toBe("malformed_json");
    expect(error.message).toMatch(/line 3, column 16/);
  });

  it("reports each bad circuit with its code, part and net", async () => {
    const replace = (id: string, change: (p: TestPart) => TestPart) => (parts: TestPart[]) =>
      parts.map((p) => (p.id === id ? change(p) : p));
    const cases: [unknown, string, { part?: string; net?: string }][] = [
      [withParts(replace("C1", (p) => ({ ...p, kind: "capacitr" }))), "unknown_kind", { part: "C1" }],
      [withParts(replace("C1", (p) => ({ ...p, pins: { a: "dia", b: "g", x: "0" } }))), "unknown_pin", { part: "C1" }],
      [withParts(replace("J1", (p) => ({ ...p, pins: { d: "vdd", g: "g" } }))), "missing_pin", { part: "J1" }],
      [withParts(replace("C1", (p) => ({ ...p, values: { capacitance: "4k7x" } }))), "invalid_value", { part: "C1" }],
      [withParts(replace("C1", (p) => ({ ...p, values: { capacitance: "50 pH" } }))), "wrong_unit", { part: "C1" }],
      [withParts((parts) => parts.filter((p) => p.id !== "R1")), "no_dc_path", { net: "dia" }],
      [
        withParts((parts) => [...parts, { id: "V3", kind: "vsource", pins: { p: "vdd", n: "0" }, values: { dc: 9 } }]),
        "source_loop",
        { part: "V3" },
      ],
      [
        withParts((parts) => [...parts, { id: "V4", kind: "vsource", pins: { p: "s", n: "s" } }]),
        "shorted_source",
        { part: "V4", net: "s" },
      ],
      [followerFile({ output: { plus: "outt", minus: "0" } }), "unknown_output_net", { net: "outt" }],
    ];
    const errors = await Promise.all(cases.map(([file]) => errorOf(write(file))));
    errors.forEach((error, i) => {
      const [, code, where] = cases[i];
      expect(error.code).toBe(code);
      expect(error).toMatchObject(where);
      expect(error.message.length).toBeGreaterThan(20);
    });
  });

  it("reports an unknown variant", async () => {
    const error = await errorOf("sim/examples/demo-microphone.json", "--variant", "colder");
    expect(error.code).toBe("unknown_variant");
    expect(error.message).toContain('"hotter bias"');
  });

  it("reads the examples it ships", () => {
    expect(JSON.parse(readFileSync("sim/examples/demo-microphone.json", "utf8")).format).toBe("backplate/circuit");
  });
});
