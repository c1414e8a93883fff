"use client";
/**
 * A drawn part: its symbol (rotated), a labelled handle per pin, its id and key value, and the solver's message
 * when the part is at fault. Pressing Enter on a focused part opens the part sheet.
 */
import { Handle, type NodeProps, Position } from "@xyflow/react";
import { memo } from "react";
import { KIND_SPECS } from "@/sim/circuit/kinds";
import { pinLabel } from "../symbols/kind-names";
import { labelLeft } from "../symbols/label-place";
import { PartSymbol } from "../symbols/part-symbol";
import { rotatedPinOffset, rotatedSide, rotatedSize, SYMBOL_BOXES, type Side } from "../symbols/pin-layout";
import type { PartFlowNode } from "./flow-model";

const POSITION: Record<Side, Position> = {
  left: Position.Left,
  right: Position.Right,
  top: Position.Top,
  bottom: Position.Bottom,
};

/** Where a pin's small name sits relative to its handle, so it never covers the wire. */
const PIN_NAME_OFFSET: Record<Side, string> = {
  left: "translate(4px, -115%)",
  right: "translate(calc(-100% - 4px), -115%)",
  top: "translate(4px, 2px)",
  bottom: "translate(4px, calc(-100% - 2px))",
};

function PartNodeView({ data, selected }: NodeProps<PartFlowNode>) {
  const { part, placement, keyText, labelWidth, error } = data;
  const box = SYMBOL_BOXES[part.kind];
  const size = rotatedSize(part.kind, placement.rotation);
  const type = typeof part.values.type === "string" ? part.values.type : undefined;
  const labelAt = labelLeft(part.kind, placement.rotation);
  const cut = labelWidth !== null;
  const tone = error ? "text-caution" : part.enabled ? "text-ink" : "text-graphite/60";
  return (
    <div
      className="relative"
      style={{ width: size.width, height: size.height }}
      data-part={part.id}
      data-testid={`part-${part.id}`}
      title={error ?? undefined}
    >
      <div
        className={`absolute inset-0 rounded-sm ${selected ? "outline-2 outline-offset-4 outline-trace" : ""} ${error ? "outline-2 outline-offset-4 outline-caution" : ""}`}
      />
      <div
        className={`absolute left-1/2 top-1/2 ${tone}`}
        style={{
          width: box.width,
          height: box.height,
          transform: `translate(-50%, -50%) rotate(${placement.rotation}deg)`,
        }}
      >
        <PartSymbol kind={part.kind} type={type} className={part.enabled ? "" : "opacity-60"} />
      </div>
      {KIND_SPECS[part.kind].pins.map((pin) => {
        const at = rotatedPinOffset(part.kind, pin, placement.rotation);
        const side = rotatedSide(box.pins[pin].side, placement.rotation);
        return (
          <Handle
            key={pin}
            id={pin}
            type="source"
            position={POSITION[side]}
            style={{ left: at.x, top: at.y, right: "auto", bottom: "auto", transform: "translate(-50%, -50%)" }}
            className="bench-handle"
            title={`${part.id} ${pinLabel(part.kind, pin)} — net ${part.pins[pin]}`}
            aria-label={`${part.id} pin ${pinLabel(part.kind, pin)}`}
            data-pin={`${part.id}.${pin}`}
          >
            <span
              className="pointer-events-none absolute left-1/2 top-1/2 whitespace-nowrap font-mono text-[9px] text-graphite"
              style={{ transform: PIN_NAME_OFFSET[side] }}
            >
              {pin}
            </span>
          </Handle>
        );
      })}
      {/* on a paper ground, so a wire drawn under the designator or value never strikes through the text; beside a
          downward pin's wire rather than over it (label-place.ts); no wider than the room beside it (label-room.ts),
          ending in an ellipsis with the whole text on hover when it is cut */}
      <div
        className={`absolute top-full mt-1 overflow-hidden whitespace-nowrap rounded-sm bg-paper/90 px-1 leading-tight ${labelAt === null ? "left-1/2 -translate-x-1/2 text-center" : "text-left"} ${cut ? "" : "pointer-events-none"}`}
        style={{ maxWidth: labelWidth ?? undefined, ...(labelAt === null ? {} : { left: labelAt }) }}
        title={cut ? `${part.id}: ${keyText}` : undefined}
        data-label-cut={cut ? "" : undefined}
      >
        <div className={`truncate font-mono text-[11px] font-medium ${error ? "text-caution" : "text-ink"}`}>
          {part.id}
          {!part.enabled && <span className="ml-1 text-graphite">(off)</span>}
        </div>
        <div className="truncate font-mono text-[10px] text-ink-soft" data-testid={`value-${part.id}`}>
          {keyText}
        </div>
      </div>
      {error && (
        <div
          role="alert"
          className="absolute bottom-full left-1/2 z-10 mb-2 w-56 -translate-x-1/2 rounded border border-caution bg-caution-bg px-2 py-1 text-[11px] leading-snug text-caution"
        >
          {error}
        </div>
      )}
    </div>
  );
}

export const PartNode = memo(PartNodeView);
