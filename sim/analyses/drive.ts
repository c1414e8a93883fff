/**
 * The drive of the large-signal analyses (contract, "Large-signal analyses"):
 *   - `spl_db`: every capsule's pressure p(t) = P·sin(2πft), P = √2·20 µPa·10^(spl_db/20) (peak of a sine of that
 *     RMS level, re 20 µPa);
 *   - `level`: the input sources (role "input"; when no source has a role, every source with a non-zero `ac` and
 *     no role "supply") at dc + level·ac·sin(2πft + ac_phase) (ac_phase is 0 unless the file sets it);
 *   - shape "burst": the same sine for `cycles` whole periods from t = 0, then nothing.
 * Also the small-signal (phasor) solution of the same drive — the periodic solution a distortion run starts
 * from — and of any chosen set of drivers (the supply ripple).
 */
import { REFERENCE_PRESSURE_PA } from "../constants";
import type { DriveRequest, ElaboratedPart } from "../circuit/types";
import type { AcDriveContext, AcStampContext, Device } from "../devices/device";
import { ComplexSystem } from "../mna/complex-system";
import { SingularMatrixError } from "../mna/singular";
import { type CompiledCircuit, singularCircuitError } from "./compile";
import type { OperatingPoint } from "./op";

/** Peak pressure of a sine at `splDb` dB SPL, Pa. */
export function splAmplitudePa(splDb: number): number {
  return Math.SQRT2 * REFERENCE_PRESSURE_PA * 10 ** (splDb / 20);
}

function isSource(part: ElaboratedPart): boolean {
  return part.kind === "vsource" || part.kind === "isource";
}

/** The sources a `level` drive drives (contract rule above). */
export function inputSources(parts: readonly ElaboratedPart[]): ElaboratedPart[] {
  const sources = parts.filter(isSource);
  if (sources.some((p) => p.role !== undefined)) return sources.filter((p) => p.role === "input");
  return sources.filter((p) => p.values.ac !== 0 && p.role !== "supply");
}

export function supplySources(parts: readonly ElaboratedPart[]): ElaboratedPart[] {
  return parts.filter((p) => isSource(p) && p.role === "supply");
}

const DEGREES_TO_RADIANS = Math.PI / 180;

export class Drive {
  readonly shape: "sine" | "burst";
  /** Hz */
  readonly frequency: number;
  readonly omega: number;
  /** peak capsule pressure, Pa (0 for a level drive) */
  readonly pressureAmplitude: number;
  /** the level multiplying each input source's `ac` (0 for an SPL drive) */
  readonly level: number;
  /** s; Infinity for a sine */
  readonly end: number;
  private readonly inputs: Map<string, { ac: number; phase: number }>;

  constructor(request: DriveRequest, parts: readonly ElaboratedPart[]) {
    this.shape = request.shape;
    this.frequency = request.frequency;
    this.omega = 2 * Math.PI * request.frequency;
    this.pressureAmplitude = request.splDb !== undefined ? splAmplitudePa(request.splDb) : 0;
    this.level = request.level ?? 0;
    this.end = request.shape === "burst" ? (request.cycles ?? 1) / request.frequency : Number.POSITIVE_INFINITY;
    this.inputs = new Map();
    if (request.level !== undefined) {
      for (const p of inputSources(parts)) {
        this.inputs.set(p.id, { ac: p.values.ac as number, phase: (p.values.ac_phase as number) * DEGREES_TO_RADIANS });
      }
    }
  }

  /** true when the drive reaches capsules (an SPL drive) */
  get acoustic(): boolean {
    return this.pressureAmplitude > 0;
  }

  /** times where the waveform has an edge (the end of a burst) */
  edges(): number[] {
    return Number.isFinite(this.end) ? [this.end] : [];
  }

  /** capsule pressure at t (s), Pa */
  pressure(t: number): number {
    if (this.pressureAmplitude === 0 || t < 0 || t >= this.end) return 0;
    return this.pressureAmplitude * Math.sin(this.omega * t);
  }

  /** the waveform added to a source's dc at t: level·ac·sin(ωt + phase), 0 for a source it does not drive */
  sourceDrive(part: ElaboratedPart, t: number): number {
    const input = this.inputs.get(part.id);
    if (!input || t < 0 || t >= this.end) return 0;
    return this.level * input.ac * Math.sin(this.omega * t + input.phase);
  }

  /** the devices the drive reaches, for its phasor solution */
  drivers(compiled: CompiledCircuit): Device[] {
    return compiled.devices.filter((d) => (this.acoustic ? d.part.kind === "capsule" : this.inputs.has(d.part.id)));
  }
}

/** A full small-signal solution vector: x(t) = Re/Im parts of X·e^{jωt}. */
export interface Phasor {
  re: Float64Array;
  im: Float64Array;
}

/**
 * The small-signal response of every unknown to `drivers` (their own `stampAcDrive`, capsules at `pressure` Pa),
 * scaled by `scale`, at `frequency` Hz, linearised at `op`. A source's ac∠phase is the phasor of
 * ac·sin(ωt + phase) when read with the Im convention.
 */
export function phasorSolution(
  compiled: CompiledCircuit,
  op: OperatingPoint,
  frequency: number,
  drivers: readonly Device[],
  pressure: number,
  scale = 1,
): Phasor {
  const n = compiled.unknowns.length;
  const system = new ComplexSystem(compiled.ac);
  const positions = compiled.ac.positionOfHandle;
  const ctx: AcStampContext = {
    x: op.x,
    thermalVoltage: op.thermalVoltage,
    addConductance: (h, v) => {
      system.conductance[positions[h]] += v;
    },
    addReactance: (h, v) => {
      system.reactance[positions[h]] += v;
    },
  };
  for (const d of compiled.devices) d.stampAc(ctx);
  const rhsRe = new Float64Array(n + 1);
  const rhsIm = new Float64Array(n + 1);
  const drive: AcDriveContext = {
    x: op.x,
    frequency,
    pressure,
    addRhs: (row, re, im) => {
      if (row < 0) return;
      rhsRe[row] += scale * re;
      rhsIm[row] += scale * im;
    },
  };
  for (const d of drivers) d.stampAcDrive?.(drive);
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  try {
    system.factorAt(2 * Math.PI * frequency);
    system.solve(rhsRe, rhsIm, re, im);
  } catch (e) {
    if (e instanceof SingularMatrixError) throw singularCircuitError(compiled.unknowns, e.unknown, "ac-solve");
    throw e;
  }
  return { re, im };
}
