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
import { type AnalysisRequests, DEFAULT_TEMPERATURE_K, type FrequencyRequest, type LogGrid } from "./types";

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
  if (asked.transient) requests.transient = asked.transient;
  if (asked.distortion) requests.distortion = asked.distortion;
  if (asked.ripple) requests.ripple = asked.ripple;
  return requests;
}
