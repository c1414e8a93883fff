/**
 * Circuit-file text → a JSON value, with a malformed file reported as a `SimError` that gives the line and column.
 */
import { SimError } from "../errors";

/** 1-based line and column of a character offset. */
export function lineAndColumn(text: string, offset: number): { line: number; column: number } {
  const before = text.slice(0, Math.max(0, Math.min(offset, text.length)));
  const lines = before.split("\n");
  return { line: lines.length, column: lines[lines.length - 1].length + 1 };
}

/** Where JSON.parse stopped: the "position N" in its message, or the end of the text when it ran out. */
function failureOffset(message: string, text: string): number {
  const position = /position (\d+)/.exec(message);
  if (position) return Number(position[1]);
  const lineColumn = /line (\d+) column (\d+)/.exec(message);
  if (lineColumn) {
    const lines = text.split("\n").slice(0, Number(lineColumn[1]) - 1);
    return lines.reduce((sum, line) => sum + line.length + 1, 0) + Number(lineColumn[2]) - 1;
  }
  return text.length;
}

export function parseCircuitJson(text: string): unknown {
  const source = text.startsWith("\uFEFF") ? text.slice(1) : text;
  try {
    return JSON.parse(source);
  } catch (error) {
    const reason = (error as Error).message.replace(/\s*\(line \d+ column \d+\)$/, "");
    const { line, column } = lineAndColumn(source, failureOffset(reason, source));
    throw new SimError(
      "malformed_json",
      `The file is not valid JSON at line ${line}, column ${column}: ${reason}. Check for a missing comma, quote or bracket there.`,
    );
  }
}
