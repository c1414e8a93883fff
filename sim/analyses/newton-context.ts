/** The DC stamping context handed to devices during Newton iterations (implements DcStampContext). */
import type { DcStampContext } from "../devices/device";
import type { RealSystem } from "../mna/real-system";

export class NewtonContext implements DcStampContext {
  x: Float64Array;
  thermalVoltage: number;
  sourceScale = 1;
  limited = false;
  private readonly values: Float64Array;
  private readonly rhs: Float64Array;
  private readonly positions: Int32Array;

  constructor(system: RealSystem, x: Float64Array, thermalVoltage: number) {
    this.values = system.values;
    this.rhs = system.rhs;
    this.positions = system.structure.positionOfHandle;
    this.x = x;
    this.thermalVoltage = thermalVoltage;
  }

  readonly add = (handle: number, value: number): void => {
    this.values[this.positions[handle]] += value;
  };
  readonly addRhs = (row: number, value: number): void => {
    if (row >= 0) this.rhs[row] += value;
  };
  readonly markLimited = (): void => {
    this.limited = true;
  };
}
