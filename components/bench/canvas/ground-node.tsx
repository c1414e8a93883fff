"use client";
/** A ground symbol: whatever is wired to it is net "0". */
import { Handle, type NodeProps, Position } from "@xyflow/react";
import { memo } from "react";
import { GroundSymbol } from "../symbols/part-symbol";
import { GROUND_HANDLE, GROUND_PIN_OFFSET, type GroundFlowNode } from "./flow-model";

function GroundNodeView({ selected, data }: NodeProps<GroundFlowNode>) {
  return (
    <div
      className={`relative h-10 w-10 ${data.error ? "text-caution" : "text-ink"} ${selected ? "rounded-sm outline-2 outline-offset-2 outline-trace" : ""}`}
      title={data.error ?? "Ground (net 0)"}
    >
      <GroundSymbol />
      <Handle
        id={GROUND_HANDLE}
        type="source"
        position={Position.Top}
        style={{ left: GROUND_PIN_OFFSET.x, top: GROUND_PIN_OFFSET.y, transform: "translate(-50%, -50%)" }}
        className="bench-handle"
        title="Ground pin (net 0)"
      />
    </div>
  );
}

export const GroundNode = memo(GroundNodeView);
