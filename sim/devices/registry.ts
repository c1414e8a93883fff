/** Every v1 part kind → its device module. */
import type { PartKind } from "../circuit/types";
import { bjtKind } from "./bjt";
import { cableKind } from "./cable";
import { capacitorKind } from "./capacitor";
import { capsuleKind } from "./capsule";
import type { DeviceKind } from "./device";
import { inductorKind } from "./inductor";
import { isourceKind } from "./isource";
import { jfetKind } from "./jfet";
import { loadKind } from "./load";
import { resistorKind } from "./resistor";
import { transformerKind } from "./transformer";
import { triodeKind } from "./triode";
import { vccsKind } from "./vccs";
import { vcvsKind } from "./vcvs";
import { vsourceKind } from "./vsource";

export const DEVICE_KINDS: Record<PartKind, DeviceKind> = {
  resistor: resistorKind,
  capacitor: capacitorKind,
  inductor: inductorKind,
  vsource: vsourceKind,
  isource: isourceKind,
  vcvs: vcvsKind,
  vccs: vccsKind,
  capsule: capsuleKind,
  jfet: jfetKind,
  triode: triodeKind,
  bjt: bjtKind,
  transformer: transformerKind,
  cable: cableKind,
  load: loadKind,
};
