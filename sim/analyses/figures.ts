/**
 * Headline figures (contract): gain_1khz_db, sensitivity_v_per_pa and sensitivity_db_re_1v_per_pa (when a
 * capsule is driven), low_corner_hz and high_corner_hz (corners.ts), output_impedance_1khz_ohm, polarity.
 * A figure that would be −∞ or NaN is null. self_noise_dba_spl stays null until the noise analysis exists.
 */
import type { Figures } from "../results";
import { toDecibels } from "./ac";
import {
  CORNER_HIGHEST_HZ,
  CORNER_LOWEST_HZ,
  findCorner,
  findCornerFromSweep,
  REFERENCE_FREQUENCY_HZ,
  type ResponseSamples,
} from "./corners";
import type { SmallSignalModel } from "./small-signal";

function finiteOrNull(v: number): number | null {
  return Number.isFinite(v) ? v : null;
}

/**
 * `sweep`, when given, must be this model's AC sweep at this `pressure` (runAc's result): the corners are then
 * bracketed from its points instead of a fresh grid walk (corners.ts), which is most of the figures' solves.
 */
export function computeFigures(model: SmallSignalModel, pressure: number, sweep?: ResponseSamples): Figures {
  const value = { re: 0, im: 0 };
  const magnitudeAt = (f: number) => {
    model.response(f, pressure, value);
    return Math.hypot(value.re, value.im);
  };
  const reference = model.response(REFERENCE_FREQUENCY_HZ, pressure, { re: 0, im: 0 });
  const magnitude = Math.hypot(reference.re, reference.im);
  const phase = Math.atan2(reference.im, reference.re);
  const driven = magnitude > 0 && Number.isFinite(magnitude);
  const capsuleDriven = pressure !== 0 && model.compiled.devices.some((d) => d.part.kind === "capsule");
  const target = magnitude / Math.SQRT2;
  const sensitivity = capsuleDriven ? magnitude / Math.abs(pressure) : Number.NaN;
  const z = model.outputImpedance(REFERENCE_FREQUENCY_HZ);
  const corner = (limit: number) =>
    sweep ? findCornerFromSweep(magnitudeAt, target, limit, sweep) : findCorner(magnitudeAt, target, limit);
  return {
    gain_1khz_db: driven ? finiteOrNull(toDecibels(magnitude)) : null,
    sensitivity_v_per_pa: capsuleDriven && driven ? finiteOrNull(sensitivity) : null,
    sensitivity_db_re_1v_per_pa: capsuleDriven && driven ? finiteOrNull(toDecibels(sensitivity)) : null,
    low_corner_hz: driven ? corner(CORNER_LOWEST_HZ) : null,
    high_corner_hz: driven ? corner(CORNER_HIGHEST_HZ) : null,
    output_impedance_1khz_ohm: finiteOrNull(Math.hypot(z.re, z.im)),
    polarity: driven ? (Math.abs(phase) <= Math.PI / 2 ? "non-inverting" : "inverting") : null,
    self_noise_dba_spl: null,
  };
}
