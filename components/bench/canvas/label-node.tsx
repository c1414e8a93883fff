"use client";
/** A net label: the net it is wired to takes its name; double-click to rename. */
import { Handle, type NodeProps, Position } from "@xyflow/react";
import { memo } from "react";
import { LABEL_HANDLE, LABEL_PIN_OFFSET, type LabelFlowNode } from "./flow-model";

function LabelNodeView({ selected, data }: NodeProps<LabelFlowNode>) {
  return (
    <div
      className={`relative flex h-6 items-center rounded-r-full border pl-3 pr-3 font-mono text-[11px] ${
        data.error ? "border-caution bg-caution-bg text-caution" : "border-trace bg-trace-light text-ink"
      } ${selected ? "outline-2 outline-offset-2 outline-trace" : ""}`}
      title={data.error ?? `Net ${data.net}`}
    >
      {data.net}
      <Handle
        id={LABEL_HANDLE}
        type="source"
        position={Position.Left}
        style={{ left: LABEL_PIN_OFFSET.x, top: LABEL_PIN_OFFSET.y, transform: "translate(-50%, -50%)" }}
        className="bench-handle"
        aria-label={`net label ${data.net}`}
      />
    </div>
  );
}

export const LabelNode = memo(LabelNodeView);
