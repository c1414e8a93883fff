/**
 * The headless command: `npm run --silent sim -- FILE.json [--variant NAME] [--check]`.
 * Prints exactly one JSON document on stdout: the results, or `{"error": {code, message, part?, net?}}` with exit
 * status 2 on bad input (3 on an internal failure). Never a stack trace.
 */
import { readFileSync } from "node:fs";
import { parseCircuitJson } from "./circuit/json";
import { isSimError } from "./errors";
import type { ErrorDocument } from "./results";
import { runCircuit } from "./run";

export const EXIT_BAD_INPUT = 2;
export const EXIT_INTERNAL = 3;
/** With --check: a target of the file is not met (the document is printed as usual, with its `checks`). */
export const EXIT_TARGET_FAILED = 1;

const USAGE = `Usage: npm run --silent sim -- FILE.json [--variant NAME] [--check]

Runs the analyses a Backplate circuit file asks for (or op, ac and noise when it asks for none)
and prints one JSON document on stdout.

  --variant NAME   apply one of the file's variants first
  --check          exit with status 1 when a target in the file's "targets" is not met
  --help           print this text

Exit status: 0 with results (with --check: and every target met); 1 with --check when a target
fails; 2 on bad input, printing {"error": {"code", "message", "part"?, "net"?}};
3 when the engine itself fails.`;

class UsageError extends Error {}

interface Arguments {
  file?: string;
  variant?: string;
  help: boolean;
  check: boolean;
}

function parseArguments(argv: readonly string[]): Arguments {
  const args: Arguments = { help: false, check: false };
  for (let i = 0; i < argv.length; i += 1) {
    const arg = argv[i];
    if (arg === "--help" || arg === "-h") args.help = true;
    else if (arg === "--check") args.check = true;
    else if (arg === "--variant" || arg.startsWith("--variant=")) {
      const name = arg === "--variant" ? argv[++i] : arg.slice("--variant=".length);
      if (name === undefined || name === "") throw new UsageError("--variant needs a variant name: --variant NAME.");
      args.variant = name;
    } else if (arg.startsWith("-") && arg !== "-") {
      throw new UsageError(`Unknown option ${arg}. The options are --variant NAME, --check and --help.`);
    } else if (args.file === undefined) args.file = arg;
    else throw new UsageError(`One circuit file at a time: got ${args.file} and ${arg}.`);
  }
  return args;
}

function print(document: unknown): void {
  process.stdout.write(`${JSON.stringify(document, null, 2)}\n`);
}

function fail(code: string, message: string, where: { part?: string; net?: string; field?: string } = {}): number {
  const error: ErrorDocument["error"] = { code, message, ...where };
  print({ error });
  return code === "internal_error" ? EXIT_INTERNAL : EXIT_BAD_INPUT;
}

function main(argv: readonly string[]): number {
  let args: Arguments;
  try {
    args = parseArguments(argv);
  } catch (error) {
    return fail("invalid_arguments", `${(error as Error).message}\n\n${USAGE}`);
  }
  if (args.help) {
    process.stdout.write(`${USAGE}\n`);
    return 0;
  }
  if (args.file === undefined) return fail("invalid_arguments", `Name a circuit file.\n\n${USAGE}`);
  let text: string;
  try {
    text = readFileSync(args.file, "utf8");
  } catch (error) {
    const reason =
      (error as NodeJS.ErrnoException).code === "ENOENT" ? "there is no such file" : (error as Error).message;
    return fail("unreadable_file", `Cannot read ${args.file}: ${reason}.`);
  }
  try {
    const document = runCircuit(parseCircuitJson(text), { variant: args.variant });
    print(document);
    const failed = (document.checks ?? []).some((check) => !check.pass);
    return args.check && failed ? EXIT_TARGET_FAILED : 0;
  } catch (error) {
    if (isSimError(error)) {
      const { code, message, ...where } = error.toJSON();
      return fail(code, message, where);
    }
    return fail("internal_error", `The engine failed on this file: ${(error as Error)?.message ?? String(error)}.`);
  }
}

process.exitCode = main(process.argv.slice(2));
