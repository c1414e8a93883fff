/**
 * The file's `analyses` → `AnalysisRequests` with every default of the contract filled in. When the file asks for no
 * analysis (no `analyses`, or only `sweep`/`spread`, which repeat the others), the default set runs: op, ac over
 * 1 Hz–100 kHz at 20 points per decade, noise over 20 Hz–20 kHz at 20 points per decade.
 */
import { SimError } from "../errors";
import { evaluateValue } from "./evaluate-value";
import { countFrequencies } from "./frequencies";
import type { NumericRange } from "./kinds";
import { QUANTITIES, type QuantityName } from "./quantities";
import { checkRange } from "./ranges";
import type { CircuitFile } from "./schema";
import {
  type AnalysisRequests,
  DEFAULT_TEMPERATURE_K,
  type DistortionRequest,
  type DriveRequest,
  type FrequencyRequest,
  type LogGrid,
  type TransientRequest,
} from "./types";

export const DEFAULT_AC_GRID: LogGrid = { from: 1, to: 100_000, pointsPerDecade: 20 };
export const DEFAULT_NOISE_GRID: LogGrid = { from: 20, to: 20_000, pointsPerDecade: 20 };
/** Pa: the contract's default acoustic drive for `ac` (1 Pa ≈ 94 dB SPL). */
export const DEFAULT_AC_PRESSURE_PA = 1;
/** More points than this in one analysis is a mistake, not a plot. */
export const MAX_FREQUENCY_POINTS = 100_000;
export const MAX_POINTS_PER_DECADE = 1000;
export const MAX_SWEEP_VALUES = 1000;

const PRIMARY_ANALYSES = ["op", "ac", "noise", "transient", "distortion", "ripple"] as const;

type RawValue = number | string | undefined;
type Scope = Readonly<Record<string, number>>;

function value(
  raw: RawValue,
  fallback: number,
  quantity: QuantityName,
  range: NumericRange,
  label: string,
  scope: Scope,
) {
  if (raw === undefined) return fallback;
  const where = { field: label, label };
  try {
    const v = evaluateValue(raw, QUANTITIES[quantity], scope, where);
    checkRange(v, range, QUANTITIES[quantity], raw, where, "invalid_analysis");
    return v;
  } catch (error) {
    if (error instanceof SimError && error.code !== "invalid_analysis") {
      throw new SimError("invalid_analysis", error.message, { field: label });
    }
    throw error;
  }
}

const POSITIVE_FREQUENCY: NumericRange = { min: 0, minExclusive: true };
const POSITIVE_TEMPERATURE: NumericRange = { min: 0, minExclusive: true };

interface RawFrequencyFields {
  from?: number | string;
  to?: number | string;
  points_per_decade?: number | string;
  frequencies?: (number | string)[];
  temperature?: number | string;
}

function frequencyRequest(raw: RawFrequencyFields, defaults: LogGrid, name: string, scope: Scope): FrequencyRequest {
  const label = `analyses.${name}`;
  let request: FrequencyRequest;
  if (raw.frequencies !== undefined) {
    if (raw.from !== undefined || raw.to !== undefined || raw.points_per_decade !== undefined) {
      throw new SimError(
        "invalid_analysis",
        `${label}: give either "frequencies" or "from", "to" and "points_per_decade", not both.`,
        { field: label },
      );
    }
    const frequencies = raw.frequencies.map((f, i) =>
      value(f, Number.NaN, "frequency", POSITIVE_FREQUENCY, `${label}.frequencies[${i}]`, scope),
    );
    request = { kind: "list", frequencies };
  } else {
    const from = value(raw.from, defaults.from, "frequency", POSITIVE_FREQUENCY, `${label}.from`, scope);
    const to = value(raw.to, defaults.to, "frequency", POSITIVE_FREQUENCY, `${label}.to`, scope);
    const pointsPerDecade = value(
      raw.points_per_decade,
      defaults.pointsPerDecade,
      "count",
      { min: 1, max: MAX_POINTS_PER_DECADE, integer: true },
      `${label}.points_per_decade`,
      scope,
    );
    if (to < from) {
      throw new SimError("invalid_analysis", `${label}: "to" (${to} Hz) is below "from" (${from} Hz). Swap them.`, {
        field: `${label}.to`,
      });
    }
    request = { kind: "grid", from, to, pointsPerDecade };
  }
  if (countFrequencies(request, MAX_FREQUENCY_POINTS) > MAX_FREQUENCY_POINTS) {
    throw new SimError(
      "invalid_analysis",
      `${label}: asks for more than ${MAX_FREQUENCY_POINTS} frequencies. Use fewer points per decade or a narrower range.`,
      { field: label },
    );
  }
  return request;
}

function temperature(raw: RawValue, name: string, scope: Scope): number {
  return value(raw, DEFAULT_TEMPERATURE_K, "temperature", POSITIVE_TEMPERATURE, `analyses.${name}.temperature`, scope);
}

/** Elaborates the analyses section with the evaluated parameters in scope. */
export function elaborateAnalyses(analyses: CircuitFile["analyses"], scope: Scope): AnalysisRequests {
  const asked = analyses ?? {};
  const requests: AnalysisRequests = {};
  const asksForNothing = !PRIMARY_ANALYSES.some((name) => asked[name] !== undefined);
  const op = asked.op ?? (asksForNothing ? {} : undefined);
  const ac = asked.ac ?? (asksForNothing ? {} : undefined);
  const noise = asked.noise ?? (asksForNothing ? {} : undefined);

  if (op) requests.op = { temperature: temperature(op.temperature, "op", scope) };
  if (ac) {
    requests.ac = {
      frequencies: frequencyRequest(ac, DEFAULT_AC_GRID, "ac", scope),
      pressure: value(ac.pressure, DEFAULT_AC_PRESSURE_PA, "pressure", {}, "analyses.ac.pressure", scope),
      temperature: temperature(ac.temperature, "ac", scope),
    };
  }
  if (noise) {
    requests.noise = {
      frequencies: frequencyRequest(noise, DEFAULT_NOISE_GRID, "noise", scope),
      temperature: temperature(noise.temperature, "noise", scope),
    };
  }
  if (asked.sweep) {
    if (asked.sweep.values.length > MAX_SWEEP_VALUES) {
      throw new SimError("invalid_analysis", `analyses.sweep.values: more than ${MAX_SWEEP_VALUES} values.`, {
        field: "analyses.sweep.values",
      });
    }
    const values = asked.sweep.values.map((raw, i) =>
      value(raw, Number.NaN, "any", {}, `analyses.sweep.values[${i}]`, scope),
    );
    requests.sweep = { parameter: asked.sweep.parameter, values };
  }
  if (asked.spread) requests.spread = { runs: asked.spread.runs, seed: asked.spread.seed };
  if (asked.transient) requests.transient = transientRequest(asked.transient, scope);
  if (asked.distortion) requests.distortion = distortionRequest(asked.distortion, scope);
  if (asked.ripple) {
    requests.ripple = {
      frequencies: frequencyRequest(asked.ripple as RawFrequencyFields, DEFAULT_AC_GRID, "ripple", scope),
      temperature: temperature(asked.ripple.temperature as RawValue, "ripple", scope),
    };
    onlyKeys(asked.ripple, ["frequencies", "from", "to", "points_per_decade", "temperature"], "analyses.ripple");
  }
  return requests;
}

/* ---- large-signal requests (contract, "Large-signal analyses") ---- */

/** More time steps than this (stop / step) is a mistake, not a waveform. */
export const MAX_TRANSIENT_STEPS = 10_000_000;
/** More distortion levels than this in one analysis. */
export const MAX_DISTORTION_LEVELS = 200;
/** Longest burst, in periods. */
export const MAX_BURST_CYCLES = 100_000;

const POSITIVE: NumericRange = { min: 0, minExclusive: true };

function invalid(field: string, message: string): SimError {
  return new SimError("invalid_analysis", `${field}: ${message}`, { field });
}

function onlyKeys(raw: Record<string, unknown>, allowed: readonly string[], label: string): void {
  for (const key of Object.keys(raw)) {
    if (!allowed.includes(key)) {
      throw invalid(`${label}.${key}`, `unknown field; the fields are ${allowed.map((k) => `"${k}"`).join(", ")}.`);
    }
  }
}

function rawValue(raw: unknown, field: string): RawValue {
  if (raw === undefined || typeof raw === "number" || typeof raw === "string") return raw;
  throw invalid(field, "give a number or a string value.");
}

function required(raw: unknown, field: string, quantity: QuantityName, range: NumericRange, scope: Scope): number {
  const v = rawValue(raw, field);
  if (v === undefined) throw invalid(field, "is required.");
  return value(v, Number.NaN, quantity, range, field, scope);
}

function valueList(raw: unknown, field: string, quantity: QuantityName, scope: Scope): number[] {
  if (!Array.isArray(raw) || raw.length === 0) throw invalid(field, "give a non-empty list of values.");
  if (raw.length > MAX_DISTORTION_LEVELS) throw invalid(field, `at most ${MAX_DISTORTION_LEVELS} values.`);
  return raw.map((item, i) => required(item, `${field}[${i}]`, quantity, {}, scope));
}

function driveRequest(raw: unknown, label: string, scope: Scope): DriveRequest {
  if (raw === null || typeof raw !== "object" || Array.isArray(raw)) {
    throw invalid(label, 'give an object such as { "shape": "sine", "frequency": 1000, "spl_db": 94 }.');
  }
  const r = raw as Record<string, unknown>;
  onlyKeys(r, ["shape", "frequency", "spl_db", "level", "cycles"], label);
  const shape = r.shape ?? "sine";
  if (shape !== "sine" && shape !== "burst") throw invalid(`${label}.shape`, 'is "sine" or "burst".');
  const frequency = required(r.frequency, `${label}.frequency`, "frequency", POSITIVE, scope);
  if ((r.spl_db === undefined) === (r.level === undefined)) {
    throw invalid(label, 'give exactly one of "spl_db" (drives the capsules) and "level" (drives the input sources).');
  }
  const drive: DriveRequest = { shape, frequency };
  if (r.spl_db !== undefined) drive.splDb = required(r.spl_db, `${label}.spl_db`, "dimensionless", {}, scope);
  else drive.level = required(r.level, `${label}.level`, "dimensionless", {}, scope);
  if (shape === "burst") {
    drive.cycles = required(
      r.cycles,
      `${label}.cycles`,
      "count",
      { min: 1, max: MAX_BURST_CYCLES, integer: true },
      scope,
    );
  } else if (r.cycles !== undefined) {
    throw invalid(`${label}.cycles`, 'applies to a "burst" only; remove it or set "shape": "burst".');
  }
  return drive;
}

function transientRequest(raw: Record<string, unknown>, scope: Scope): TransientRequest {
  const label = "analyses.transient";
  onlyKeys(raw, ["stop", "step", "from", "drive", "probe", "temperature"], label);
  const stop = required(raw.stop, `${label}.stop`, "any", POSITIVE, scope);
  const step = required(raw.step, `${label}.step`, "any", POSITIVE, scope);
  if (step > stop) throw invalid(`${label}.step`, `the largest step (${step} s) is longer than stop (${stop} s).`);
  if (stop / step > MAX_TRANSIENT_STEPS) {
    throw invalid(`${label}.step`, `stop / step is more than ${MAX_TRANSIENT_STEPS} steps; use a longer step.`);
  }
  const from = raw.from ?? "op";
  if (from !== "op" && from !== "power-on") throw invalid(`${label}.from`, 'is "op" (default) or "power-on".');
  const probe = raw.probe ?? [];
  if (!Array.isArray(probe) || probe.some((n) => typeof n !== "string")) {
    throw invalid(`${label}.probe`, 'give a list of net names, such as ["out", "g"].');
  }
  const request: TransientRequest = {
    stop,
    step,
    from,
    probe: probe as string[],
    temperature: temperature(rawValue(raw.temperature, `${label}.temperature`), "transient", scope),
  };
  if (raw.drive !== undefined) request.drive = driveRequest(raw.drive, `${label}.drive`, scope);
  return request;
}

function distortionRequest(raw: Record<string, unknown>, scope: Scope): DistortionRequest {
  const label = "analyses.distortion";
  onlyKeys(raw, ["frequency", "spl_db", "levels", "temperature"], label);
  const frequency = required(raw.frequency, `${label}.frequency`, "frequency", POSITIVE, scope);
  if ((raw.spl_db === undefined) === (raw.levels === undefined)) {
    throw invalid(label, 'give exactly one of "spl_db": [...] (capsule drive) and "levels": [...] (input sources).');
  }
  const request: DistortionRequest = {
    frequency,
    temperature: temperature(rawValue(raw.temperature, `${label}.temperature`), "distortion", scope),
  };
  if (raw.spl_db !== undefined) request.splDb = valueList(raw.spl_db, `${label}.spl_db`, "dimensionless", scope);
  else request.levels = valueList(raw.levels, `${label}.levels`, "dimensionless", scope);
  return request;
}
