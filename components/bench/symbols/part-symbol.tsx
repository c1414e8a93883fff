/**
 * A part's schematic symbol as inline SVG for the bench canvas and tray, drawn from the shared path data of
 * symbol-geometry.ts (the report page and the sign-off PDF draw the same strokes).
 */
import type { PartKind } from "@/sim/circuit/types";
import { SYMBOL_BOXES } from "./pin-layout";
import { GROUND_BOX, GROUND_STROKES, SYMBOL_STROKE, type SymbolStroke, symbolStrokes } from "./symbol-geometry";

/** The strokes as SVG paths, inheriting colour from the surrounding text. */
export function SymbolPaths({ strokes }: { strokes: SymbolStroke[] }) {
  return strokes.map((s) => (
    <path
      key={s.d}
      d={s.d}
      strokeWidth={s.width}
      strokeDasharray={s.dash}
      fill={s.filled ? "currentColor" : undefined}
    />
  ));
}

export function PartSymbol({ kind, type, className }: { kind: PartKind; type?: string; className?: string }) {
  const box = SYMBOL_BOXES[kind];
  return (
    <svg
      viewBox={`0 0 ${box.width} ${box.height}`}
      width={box.width}
      height={box.height}
      className={className}
      fill="none"
      stroke="currentColor"
      strokeWidth={SYMBOL_STROKE}
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden="true"
    >
      <SymbolPaths strokes={symbolStrokes(kind, type)} />
    </svg>
  );
}

export function GroundSymbol({ className }: { className?: string }) {
  return (
    <svg
      viewBox={`0 0 ${GROUND_BOX.width} ${GROUND_BOX.height}`}
      width={GROUND_BOX.width}
      height={GROUND_BOX.height}
      className={className}
      fill="none"
      stroke="currentColor"
      strokeWidth={SYMBOL_STROKE}
      strokeLinecap="round"
      aria-hidden="true"
    >
      <SymbolPaths strokes={GROUND_STROKES} />
    </svg>
  );
}
