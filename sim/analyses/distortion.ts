/**
 * Distortion at one drive level: a transient run from the small-signal periodic solution (the operating point
 * plus Im(X·e^{jωt}) at t = 0, so a linear circuit starts on its steady state and only the nonlinearity has to
 * settle), sampled exactly DISTORTION_POINTS_PER_PERIOD times per period (the steps land on the sample grid),
 * and analysed period by period (dft.ts). The waveform counts as periodic once the THD of consecutive whole
 * periods agrees within DISTORTION_SETTLE_RELATIVE (1 %, contract) of its value, DISTORTION_SETTLE_CONFIRMATIONS
 * times in a row; the harmonics are those of the last period. Along that period, each active device's nearest
 * region boundary (Device.regionMargin) is tracked for max_spl_limited_by.
 */
import type { ElaboratedPart } from "../circuit/types";
import type { Device, RegionMargin } from "../devices/device";
import type { SimWarning } from "../results";
import type { CompiledCircuit } from "./compile";
import { type DistortionFigures, distortionOf } from "./dft";
import { Drive, type Phasor } from "./drive";
import type { OperatingPoint } from "./op";
import { type RunControl, TransientRun } from "./transient";

export const DISTORTION_POINTS_PER_PERIOD = 64;
/** contract: THD within 1 % of its steady value over successive whole periods */
export const DISTORTION_SETTLE_RELATIVE = 0.01;
/** absolute THD agreement that also counts as settled (numerical noise on a nearly linear circuit), % */
export const DISTORTION_SETTLE_ABSOLUTE_PERCENT = 1e-5;
export const DISTORTION_SETTLE_CONFIRMATIONS = 1;
export const DISTORTION_MAX_PERIODS = 400;
/** contract: a capsule gap more than 10 % closed by the drive is warned about */
export const CAPSULE_GAP_WARNING_FRACTION = 0.1;

export interface LevelResult {
  figures: DistortionFigures;
  periods: number;
  settled: boolean;
  /** the device nearest to (or furthest past) its region boundary over the last period */
  limit: { part: string; margin: RegionMargin } | null;
}

/** Everything a level needs that does not change with the level: compiled circuit, op, unit phasor. */
export interface DistortionSetup {
  compiled: CompiledCircuit;
  op: OperatingPoint;
  frequency: number;
  /** "spl": capsules; "level": input sources */
  mode: "spl" | "level";
  /** small-signal solution for 1 Pa on every capsule, or for level 1 */
  unitPhasor: Phasor;
}

function scaled(p: Phasor, s: number): Phasor {
  return { re: p.re.map((v) => v * s), im: p.im.map((v) => v * s) };
}

export function distortionAtLevel(setup: DistortionSetup, amount: number, control: RunControl = {}): LevelResult {
  const { compiled, op, frequency } = setup;
  const parts = compiled.circuit.parts;
  const drive = new Drive(
    setup.mode === "spl" ? { shape: "sine", frequency, splDb: amount } : { shape: "sine", frequency, level: amount },
    parts,
  );
  const amplitude = setup.mode === "spl" ? drive.pressureAmplitude : amount;
  const period = 1 / frequency;
  const interval = period / DISTORTION_POINTS_PER_PERIOD;
  const run = new TransientRun(compiled, op, {
    start: "periodic",
    maxStep: interval,
    drive,
    phasor: scaled(setup.unitPhasor, amplitude),
    landing: interval,
  });
  const plus = compiled.netIndex.get(compiled.circuit.output.plus) ?? -1;
  const minus = compiled.netIndex.get(compiled.circuit.output.minus) ?? -1;
  const output = (x: Float64Array) => (plus < 0 ? 0 : x[plus]) - (minus < 0 ? 0 : x[minus]);
  const active = compiled.devices.filter((d) => d.regionMargin !== undefined);
  const record = new Float64Array(DISTORTION_POINTS_PER_PERIOD + 1);
  let filled = 0;
  record[filled++] = output(run.x);
  let previous: DistortionFigures | null = null;
  let figures: DistortionFigures | null = null;
  let confirmations = 0;
  let periods = 0;
  let limit: LevelResult["limit"] = null;
  let minima = new Map<Device, RegionMargin>();
  const track = (x: Float64Array) => {
    for (const d of active) {
      const m = d.regionMargin!(x, op.thermalVoltage);
      if (!m) continue;
      const best = minima.get(d);
      if (!best || m.margin < best.margin) minima.set(d, m);
    }
  };
  track(run.x);
  while (periods < DISTORTION_MAX_PERIODS) {
    run.advance(
      (periods + 1) * period,
      (_t, x, landing) => {
        if (!landing) return;
        record[filled++] = output(x);
        track(x);
      },
      control,
    );
    periods++;
    figures = distortionOf(record, 1);
    limit = nearest(minima);
    minima = new Map();
    track(run.x);
    record[0] = record[DISTORTION_POINTS_PER_PERIOD];
    filled = 1;
    if (previous) {
      const agree =
        Math.abs(figures.thd_percent - previous.thd_percent) <=
        DISTORTION_SETTLE_RELATIVE * figures.thd_percent + DISTORTION_SETTLE_ABSOLUTE_PERCENT;
      confirmations = agree ? confirmations + 1 : 0;
      if (confirmations >= DISTORTION_SETTLE_CONFIRMATIONS) return { figures, periods, settled: true, limit };
    }
    previous = figures;
  }
  return { figures: figures!, periods, settled: false, limit };
}

function nearest(minima: Map<Device, RegionMargin>): LevelResult["limit"] {
  let out: LevelResult["limit"] = null;
  for (const [d, m] of minima) if (!out || m.margin < out.margin.margin) out = { part: d.part.id, margin: m };
  return out;
}

/** Warnings for a drive that closes a capsule's gap by more than CAPSULE_GAP_WARNING_FRACTION (linear model). */
export function capsuleGapWarnings(
  parts: readonly ElaboratedPart[],
  peakPressurePa: number,
  frequency: number,
): SimWarning[] {
  const out: SimWarning[] = [];
  for (const p of parts) {
    if (p.kind !== "capsule") continue;
    const f0 = typeof p.values.resonance === "number" ? p.values.resonance : undefined;
    let gain = 1;
    if (f0 !== undefined) {
      const r = frequency / f0;
      gain = 1 / Math.hypot(1 - r * r, r / (p.values.q as number));
    }
    const closed = (p.values.strain_per_pa as number) * peakPressurePa * gain;
    if (closed > CAPSULE_GAP_WARNING_FRACTION) {
      out.push({
        part: p.id,
        message: `${p.id}: the drive closes the capsule gap by ${(100 * closed).toFixed(0)} % at its peak (more than ${100 * CAPSULE_GAP_WARNING_FRACTION} %); the linear capsule model no longer holds, so distortion at this level is the electronics' alone`,
      });
    }
  }
  return out;
}
