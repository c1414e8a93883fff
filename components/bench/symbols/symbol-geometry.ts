/**
 * The schematic symbol of each kind as plain path data, drawn by hand after the open standards' shapes (IEC 60617
 * rectangle resistor, two-plate capacitor, coil, circled sources, diamond controlled sources, JFET/BJT/triode with
 * their electrodes). One definition for every place that draws a part: the bench canvas and tray (part-symbol.tsx),
 * the report page (SVG) and the sign-off PDF (react-pdf Path). Leads end exactly at the pins of pin-layout.ts; the
 * box is unrotated (the drawer rotates it about its centre). Pure data: no React, so the PDF renderer can use it.
 */
import type { PartKind } from "@/sim/circuit/types";

export interface SymbolStroke {
  d: string;
  /** stroke width in symbol units; the default is SYMBOL_STROKE */
  width?: number;
  dash?: string;
  /** filled with the stroke colour (the transformer's phase dots) */
  filled?: boolean;
}

/** The stroke width every symbol is drawn with, in symbol (canvas) units. */
export const SYMBOL_STROKE = 1.75;

/** A circle as path data (two half arcs), so every renderer draws it from the same `d`. */
const circle = (cx: number, cy: number, r: number) => ellipse(cx, cy, r, r);
const ellipse = (cx: number, cy: number, rx: number, ry: number) =>
  `M${cx - rx} ${cy}a${rx} ${ry} 0 1 0 ${2 * rx} 0a${rx} ${ry} 0 1 0 ${-2 * rx} 0Z`;
const rect = (x: number, y: number, w: number, h: number) => `M${x} ${y}H${x + w}V${y + h}H${x}Z`;

const line = (d: string, extra: Omit<SymbolStroke, "d"> = {}): SymbolStroke => ({ d, ...extra });

const controlled = (current: boolean): SymbolStroke[] => [
  line("M0 20H20M0 80H20"),
  line(circle(22, 20, 2)),
  line(circle(22, 80, 2)),
  line("M30 20H36M33 17V23M30 80H36"),
  line("M120 20H84V26M120 80H84V74"),
  line("M84 26L108 50L84 74L60 50Z"),
  current ? line("M84 62V38M78 44L84 37L90 44") : line("M84 36V46M79 41H89M79 60H89"),
];

type Drawing = (type?: string) => SymbolStroke[];

const DRAWINGS: Record<PartKind, Drawing> = {
  resistor: () => [line("M0 20H30M90 20H120"), line(rect(30, 11, 60, 18))],
  capacitor: () => [line("M0 20H54M66 20H120"), line("M54 4V36M66 4V36", { width: 3 })],
  inductor: () => [line("M0 20H24a9 9 0 0 1 18 0a9 9 0 0 1 18 0a9 9 0 0 1 18 0a9 9 0 0 1 18 0H120")],
  vsource: () => [line("M40 0V28M40 72V100"), line(circle(40, 50, 22)), line("M40 36V48M34 42H46M34 60H46")],
  // current is taken from p and delivered into n: the arrow points from p to n
  isource: () => [line("M40 0V28M40 72V100"), line(circle(40, 50, 22)), line("M40 36V62M33 55L40 64L47 55")],
  vcvs: () => controlled(false),
  vccs: () => controlled(true),
  load: () => [line("M40 0V26M40 74V100"), line(rect(28, 26, 24, 48)), line("M58 50H72M66 44L72 50L66 56")],
  // diaphragm (thin, flexing) over a perforated backplate
  capsule: () => [
    line("M40 0V40M40 60V100"),
    line("M12 40H68"),
    line("M16 34Q40 26 64 34", { dash: "3 3" }),
    line("M12 60H22M28 60H36M44 60H52M58 60H68", { width: 4 }),
  ],
  jfet: (type) => [
    line(circle(52, 50, 32)),
    line("M48 30V70", { width: 3 }),
    line("M48 36H60V0M48 64H60V100M0 60H48"),
    type === "p" ? line("M30 54L20 60L30 66") : line("M36 54L46 60L36 66"),
  ],
  bjt: (type) => [
    line(circle(50, 60, 30)),
    line("M38 42V78", { width: 3 }),
    line("M0 60H38M38 52L60 34V0M38 68L60 86V100"),
    type === "pnp" ? line("M47 72L40 70L43 63") : line("M51 86L60 86L57 78"),
  ],
  triode: () => [
    line(circle(50, 62, 40)),
    line("M40 0V36M24 36H58", { width: 2.5 }),
    line("M0 60H20M20 60H78", { dash: "4 4" }),
    line("M38 90Q38 84 44 84H70M60 84V120"),
  ],
  transformer: () => [
    line("M0 20H40M0 80H40M80 20H120M80 80H120"),
    line("M40 20a7.5 7.5 0 0 1 0 15a7.5 7.5 0 0 1 0 15a7.5 7.5 0 0 1 0 15a7.5 7.5 0 0 1 0 15"),
    line("M80 20a7.5 7.5 0 0 0 0 15a7.5 7.5 0 0 0 0 15a7.5 7.5 0 0 0 0 15a7.5 7.5 0 0 0 0 15"),
    line("M56 16V84M64 16V84", { width: 2 }),
    line(circle(30, 30, 2.5), { filled: true }),
    line(circle(90, 30, 2.5), { filled: true }),
  ],
  cable: () => [
    line("M0 20H160"),
    line("M30 9H130M30 31H130", { dash: "5 3" }),
    line(ellipse(30, 20, 5, 11)),
    line(ellipse(130, 20, 5, 11)),
    line("M80 31V40"),
  ],
};

/** The strokes of one kind's symbol (`type` picks the JFET channel or BJT polarity). */
export function symbolStrokes(kind: PartKind, type?: string): SymbolStroke[] {
  return DRAWINGS[kind](type);
}

/** The ground symbol in a 40×40 box, its connection point at the top centre (20, 0). */
export const GROUND_BOX = { width: 40, height: 40, pin: { x: 20, y: 0 } };
export const GROUND_STROKES: SymbolStroke[] = [line("M20 0V18M8 18H32M13 25H27M17 32H23")];
