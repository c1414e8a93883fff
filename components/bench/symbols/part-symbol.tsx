/**
 * The schematic symbol of each kind, drawn by hand in SVG after the open standards' shapes (IEC 60617 rectangle
 * resistor, two-plate capacitor, coil, circled sources, diamond controlled sources, JFET/BJT/triode with their
 * electrodes). Leads end exactly at the pins of pin-layout.ts; the box is unrotated (the node rotates it).
 */
import type { ReactElement } from "react";
import type { PartKind } from "@/sim/circuit/types";
import { SYMBOL_BOXES } from "./pin-layout";

type Draw = (props: { type?: string }) => ReactElement;

const Resistor: Draw = () => (
  <>
    <path d="M0 20H30M90 20H120" />
    <rect x="30" y="11" width="60" height="18" rx="1" />
  </>
);

const Capacitor: Draw = () => (
  <>
    <path d="M0 20H54M66 20H120" />
    <path d="M54 4V36M66 4V36" strokeWidth="3" />
  </>
);

const Inductor: Draw = () => (
  <path d="M0 20H24a9 9 0 0 1 18 0a9 9 0 0 1 18 0a9 9 0 0 1 18 0a9 9 0 0 1 18 0H120" />
);

const VSource: Draw = () => (
  <>
    <path d="M40 0V28M40 72V100" />
    <circle cx="40" cy="50" r="22" />
    <path d="M40 36V48M34 42H46M34 60H46" />
  </>
);

const ISource: Draw = () => (
  <>
    <path d="M40 0V28M40 72V100" />
    <circle cx="40" cy="50" r="22" />
    {/* current is taken from p and delivered into n: the arrow points from p to n */}
    <path d="M40 36V62M33 55L40 64L47 55" />
  </>
);

const Load: Draw = () => (
  <>
    <path d="M40 0V26M40 74V100" />
    <rect x="28" y="26" width="24" height="48" rx="1" />
    <path d="M58 50H72M66 44L72 50L66 56" />
  </>
);

const Capsule: Draw = () => (
  <>
    {/* diaphragm (thin, flexing) over a perforated backplate */}
    <path d="M40 0V40M40 60V100" />
    <path d="M12 40H68" />
    <path d="M16 34Q40 26 64 34" strokeDasharray="3 3" />
    <path d="M12 60H22M28 60H36M44 60H52M58 60H68" strokeWidth="4" />
  </>
);

const Jfet: Draw = ({ type }) => (
  <>
    <circle cx="52" cy="50" r="32" />
    <path d="M48 30V70" strokeWidth="3" />
    <path d="M48 36H60V0M48 64H60V100M0 60H48" />
    {type === "p" ? <path d="M30 54L20 60L30 66" /> : <path d="M36 54L46 60L36 66" />}
  </>
);

const Bjt: Draw = ({ type }) => (
  <>
    <circle cx="50" cy="60" r="30" />
    <path d="M38 42V78" strokeWidth="3" />
    <path d="M0 60H38M38 52L60 34V0M38 68L60 86V100" />
    {type === "pnp" ? <path d="M47 72L40 70L43 63" /> : <path d="M51 86L60 86L57 78" />}
  </>
);

const Triode: Draw = () => (
  <>
    <circle cx="50" cy="62" r="40" />
    <path d="M40 0V36M24 36H58" strokeWidth="2.5" />
    <path d="M0 60H20M20 60H78" strokeDasharray="4 4" />
    <path d="M38 90Q38 84 44 84H70M60 84V120" />
  </>
);

const Transformer: Draw = () => (
  <>
    <path d="M0 20H40M0 80H40M80 20H120M80 80H120" />
    <path d="M40 20a7.5 7.5 0 0 1 0 15a7.5 7.5 0 0 1 0 15a7.5 7.5 0 0 1 0 15a7.5 7.5 0 0 1 0 15" />
    <path d="M80 20a7.5 7.5 0 0 0 0 15a7.5 7.5 0 0 0 0 15a7.5 7.5 0 0 0 0 15a7.5 7.5 0 0 0 0 15" />
    <path d="M56 16V84M64 16V84" strokeWidth="2" />
    <circle cx="30" cy="30" r="2.5" fill="currentColor" />
    <circle cx="90" cy="30" r="2.5" fill="currentColor" />
  </>
);

const Cable: Draw = () => (
  <>
    <path d="M0 20H160" />
    <path d="M30 9H130M30 31H130" strokeDasharray="5 3" />
    <ellipse cx="30" cy="20" rx="5" ry="11" />
    <ellipse cx="130" cy="20" rx="5" ry="11" />
    <path d="M80 31V40" />
  </>
);

const controlled =
  (current: boolean): Draw =>
  () => (
    <>
      <path d="M0 20H20M0 80H20" />
      <circle cx="22" cy="20" r="2" />
      <circle cx="22" cy="80" r="2" />
      <path d="M30 20H36M33 17V23M30 80H36" />
      <path d="M120 20H84V26M120 80H84V74" />
      <path d="M84 26L108 50L84 74L60 50Z" />
      {current ? (
        <path d="M84 62V38M78 44L84 37L90 44" />
      ) : (
        <path d="M84 36V46M79 41H89M79 60H89" />
      )}
    </>
  );

const DRAWINGS: Record<PartKind, Draw> = {
  resistor: Resistor,
  capacitor: Capacitor,
  inductor: Inductor,
  vsource: VSource,
  isource: ISource,
  vcvs: controlled(false),
  vccs: controlled(true),
  capsule: Capsule,
  jfet: Jfet,
  triode: Triode,
  bjt: Bjt,
  transformer: Transformer,
  cable: Cable,
  load: Load,
};

export function PartSymbol({ kind, type, className }: { kind: PartKind; type?: string; className?: string }) {
  const box = SYMBOL_BOXES[kind];
  const Drawing = DRAWINGS[kind];
  return (
    <svg
      viewBox={`0 0 ${box.width} ${box.height}`}
      width={box.width}
      height={box.height}
      className={className}
      fill="none"
      stroke="currentColor"
      strokeWidth="1.75"
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden="true"
    >
      <Drawing type={type} />
    </svg>
  );
}

export function GroundSymbol({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 40 40" width={40} height={40} className={className} fill="none" stroke="currentColor"
      strokeWidth="1.75" strokeLinecap="round" aria-hidden="true">
      <path d="M20 0V18M8 18H32M13 25H27M17 32H23" />
    </svg>
  );
}
