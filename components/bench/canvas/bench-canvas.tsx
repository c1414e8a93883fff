"use client";
/**
 * The bench's drawing surface (React Flow 12): parts, ground symbols, net labels and wires from the store; drag to
 * move (snapped to the grid, one undo step per drag), drag pin to pin to wire, drop kinds from the tray, keyboard
 * shortcuts (see shortcuts.ts, "?" lists them). The solver's error marks its part or net in caution.
 */
import "@xyflow/react/dist/style.css";
import "./canvas.css";
import {
  Background,
  BackgroundVariant,
  type Connection,
  ConnectionLineType,
  ConnectionMode,
  ControlButton,
  Controls,
  type EdgeChange,
  type NodeChange,
  getViewportForBounds,
  ReactFlow,
  useReactFlow,
} from "@xyflow/react";
import { type DragEvent, type KeyboardEvent, useCallback, useEffect, useMemo, useRef, useState } from "react";
import type { SimErrorJson } from "@/sim/errors";
import { PART_KINDS, type PartKind } from "@/sim/circuit/types";
import { boxCentredOn, groundCentredOn, type Rect } from "../document/free-spot";
import { GRID } from "../document/layout";
import { nextFreeId } from "../document/ids";
import { netNames } from "../document/nets";
import { useBench, useBenchStore } from "../store/bench-store-context";
import type { Selection } from "../store/selection";
import { CANVAS_ATTRIBUTE, canvasCentre, FOCUS_SHEET_EVENT, KIND_DRAG_TYPE } from "./canvas-centre";
import {
  type BenchFlowNode,
  endpointOfHandle,
  itemOfNodeId,
  keepUnchangedEdges,
  keepUnchangedNodes,
  toFlowEdges,
  toFlowNodes,
  type WireFlowEdge,
} from "./flow-model";
import { GroundNode } from "./ground-node";
import { HelpOverlay } from "./help-overlay";
import { LabelNode } from "./label-node";
import { PartNode } from "./part-node";
import { commandOfKey } from "./shortcuts";
import { useWireRoutes } from "./use-wire-routes";
import { WireEdge } from "./wire-edge";

const NODE_TYPES = { part: PartNode, ground: GroundNode, netLabel: LabelNode };
const EDGE_TYPES = { wire: WireEdge };
// minZoom: a fitted drawing never shrinks its 10 px value labels below 9 px on screen (a large circuit is then
// fitted as far as it stays readable, and panned for the rest)
const FIT_OPTIONS = { padding: 0.2, maxZoom: 1.4, minZoom: 0.9 };
/**
 * Below this canvas width (a phone, read-only use) the whole drawing is fitted with a narrow margin even when that
 * takes it below the readable zoom: a phone user first needs to see the whole circuit, then pinches or taps + to
 * read a part (the part values are also listed, readable, under the operating point).
 */
const NARROW_CANVAS_PX = 640;
const NARROW_FIT_OPTIONS = { ...FIT_OPTIONS, padding: 0.05, minZoom: 0.2 };

/** The fit for a canvas this wide (px). */
function fitOptionsFor(width: number) {
  return width > 0 && width < NARROW_CANVAS_PX ? NARROW_FIT_OPTIONS : FIT_OPTIONS;
}

function canvasWidth(): number {
  return typeof window === "undefined" ? 0 : window.innerWidth;
}
/** The canvas is fitted again when its width changes by more than this share (a phone turned, a window snapped). */
const REFIT_WIDTH_CHANGE = 0.25;

/** Four corners drawn inward: the whole drawing brought into view. */
function FitIcon() {
  return (
    <svg viewBox="0 0 16 16" aria-hidden="true" fill="none" stroke="currentColor" strokeWidth="1.6">
      <path d="M2 6V2h4M10 2h4v4M14 10v4h-4M6 14H2v-4" />
    </svg>
  );
}

function isTyping(target: EventTarget | null): boolean {
  const element = target as HTMLElement | null;
  return !!element && (element.isContentEditable || ["INPUT", "TEXTAREA", "SELECT"].includes(element.tagName));
}

export function BenchCanvas({ error }: { error: SimErrorJson | null }) {
  const store = useBenchStore();
  const document = useBench((s) => s.document);
  const selection = useBench((s) => s.selection);
  const readOnly = useBench((s) => s.readOnly);
  const flow = useReactFlow();
  const [help, setHelp] = useState(false);
  // the canvas takes keyboard focus when its background is clicked, so shortcuts reach it
  const surface = useRef<HTMLElement>(null);
  // the whole drawing's box as last routed, for fitting the view from callbacks
  const drawing = useRef<Rect | null>(null);

  // fits the whole drawing, wires and labels included (drawing-bounds.ts): React Flow's fitView sees node boxes only
  const fitDrawing = useCallback(() => {
    const element = surface.current;
    const box = drawing.current;
    const options = fitOptionsFor(canvasWidth());
    if (!element || !box || element.clientWidth === 0) return;
    const { clientWidth, clientHeight } = element;
    flow.setViewport(
      getViewportForBounds(box, clientWidth, clientHeight, options.minZoom, options.maxZoom, options.padding),
    );
  }, [flow]);

  // a drawing fitted to a 1440-wide window is mostly off screen on a 390-wide one: refit on a large width change,
  // but not on small ones, so a view the user zoomed into stays put while a window is nudged
  useEffect(() => {
    const element = surface.current;
    if (!element || typeof ResizeObserver === "undefined") return;
    let fittedWidth = element.clientWidth;
    const observer = new ResizeObserver(() => {
      const width = element.clientWidth;
      if (width === 0 || fittedWidth === 0) {
        fittedWidth = width;
        return;
      }
      if (Math.abs(width - fittedWidth) / fittedWidth > REFIT_WIDTH_CHANGE) {
        fittedWidth = width;
        requestAnimationFrame(fitDrawing);
      }
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, [fitDrawing]);

  // unchanged nodes and wires keep their objects from the last render (React Flow then leaves them alone)
  const lastNodes = useRef<BenchFlowNode[]>([]);
  const lastEdges = useRef<WireFlowEdge[]>([]);
  const nodes = useMemo(() => {
    lastNodes.current = keepUnchangedNodes(
      lastNodes.current,
      toFlowNodes(document, selection, error, document.circuit.parameters),
    );
    return lastNodes.current;
  }, [document, selection, error]);
  const { routes, bounds } = useWireRoutes(document, nodes);
  drawing.current = bounds;
  // fitted once the canvas is ready and something is drawn (at once, or when a starting point is chosen)
  const [flowReady, setFlowReady] = useState(false);
  const fittedOnce = useRef(false);
  const hasDrawing = bounds !== null;
  useEffect(() => {
    if (!flowReady || !hasDrawing || fittedOnce.current) return;
    fittedOnce.current = true;
    fitDrawing();
  }, [flowReady, hasDrawing, fitDrawing]);

  const edges = useMemo(() => {
    lastEdges.current = keepUnchangedEdges(lastEdges.current, toFlowEdges(document, selection, error, routes));
    return lastEdges.current;
  }, [document, selection, error, routes]);

  const applySelection = useCallback(
    (changes: { id: string; selected: boolean; node: boolean }[]) => {
      if (changes.length === 0) return;
      const current = store.getState().selection;
      const sets = {
        parts: new Set(current.parts),
        grounds: new Set(current.grounds),
        labels: new Set(current.labels),
        wires: new Set(current.wires),
      };
      for (const change of changes) {
        let set: Set<string>;
        let id = change.id;
        if (change.node) {
          const item = itemOfNodeId(change.id);
          if (!item) continue;
          id = item.id;
          set = item.kind === "part" ? sets.parts : item.kind === "ground" ? sets.grounds : sets.labels;
        } else set = sets.wires;
        if (change.selected) set.add(id);
        else set.delete(id);
      }
      const next: Selection = {
        parts: [...sets.parts],
        grounds: [...sets.grounds],
        labels: [...sets.labels],
        wires: [...sets.wires],
      };
      store.getState().select(next);
    },
    [store],
  );

  const onNodesChange = useCallback(
    (changes: NodeChange<BenchFlowNode>[]) => {
      const selects: { id: string; selected: boolean; node: boolean }[] = [];
      for (const change of changes) {
        if (change.type === "position" && change.position) {
          const item = itemOfNodeId(change.id);
          if (item) store.getState().movePart(item, change.position, { record: false });
        } else if (change.type === "select") {
          selects.push({ id: change.id, selected: change.selected, node: true });
        }
      }
      applySelection(selects);
    },
    [store, applySelection],
  );

  const onEdgesChange = useCallback(
    (changes: EdgeChange[]) => {
      applySelection(
        changes.flatMap((c) => (c.type === "select" ? [{ id: c.id, selected: c.selected, node: false }] : [])),
      );
    },
    [applySelection],
  );

  const onConnect = useCallback(
    (connection: Connection) => {
      const from = endpointOfHandle(connection.source, connection.sourceHandle);
      const to = endpointOfHandle(connection.target, connection.targetHandle);
      if (from && to) store.getState().connect(from, to);
    },
    [store],
  );

  const addLabel = useCallback(
    (at: { x: number; y: number }) => {
      const name = nextFreeId("net", netNames(store.getState().document.circuit));
      store.getState().addNetLabel(at, name);
    },
    [store],
  );

  const onDrop = useCallback(
    (event: DragEvent) => {
      const kind = event.dataTransfer.getData(KIND_DRAG_TYPE);
      if (!kind) return;
      event.preventDefault();
      const at = flow.screenToFlowPosition({ x: event.clientX, y: event.clientY });
      if (kind === "ground") store.getState().addGround(groundCentredOn(at));
      else if (kind === "label") addLabel(at);
      else if ((PART_KINDS as readonly string[]).includes(kind))
        store.getState().addPart(kind as PartKind, boxCentredOn(kind as PartKind, at));
    },
    [flow, store, addLabel],
  );

  const onKeyDown = (event: KeyboardEvent) => {
    if (isTyping(event.target)) return;
    if (event.key === "Enter") {
      const element = (event.target as HTMLElement).closest("[data-id]");
      const item = element ? itemOfNodeId(element.getAttribute("data-id") ?? "") : null;
      if (item?.kind === "part") {
        event.preventDefault();
        store.getState().select({ parts: [item.id] });
        // after React has drawn the newly selected part's sheet, whose listener takes the focus
        window.setTimeout(() => window.dispatchEvent(new CustomEvent(FOCUS_SHEET_EVENT)), 0);
      }
      return;
    }
    const command = commandOfKey(event);
    if (!command) return;
    const state = store.getState();
    switch (command) {
      case "help":
        setHelp((open) => !open);
        break;
      case "escape":
        setHelp(false);
        state.clearSelection();
        break;
      case "fit":
        fitDrawing();
        break;
      case "rotate":
        state.rotatePart();
        break;
      case "delete":
        state.deleteSelection();
        break;
      case "copy":
        state.copy();
        break;
      case "paste":
        state.paste();
        break;
      case "undo":
        state.undo();
        break;
      case "redo":
        state.redo();
        break;
      case "ground":
        state.addGround(canvasCentre(flow));
        break;
      case "label":
        addLabel(canvasCentre(flow));
        break;
    }
    event.preventDefault();
  };

  const netError = error && !error.part && error.net ? error : null;

  return (
    <section
      ref={surface}
      tabIndex={-1}
      className="bench-canvas relative h-full min-h-0 w-full bg-paper outline-none"
      aria-label="Bench canvas"
      {...{ [CANVAS_ATTRIBUTE]: "" }}
      onKeyDown={onKeyDown}
      onDragOver={(e) => {
        if (e.dataTransfer.types.includes(KIND_DRAG_TYPE)) {
          e.preventDefault();
          e.dataTransfer.dropEffect = "copy";
        }
      }}
      onDrop={onDrop}
    >
      <ReactFlow<BenchFlowNode, WireFlowEdge>
        nodes={nodes}
        edges={edges}
        nodeTypes={NODE_TYPES}
        edgeTypes={EDGE_TYPES}
        onNodesChange={onNodesChange}
        onEdgesChange={onEdgesChange}
        onConnect={onConnect}
        onNodeDragStart={() => store.getState().checkpoint()}
        onNodeDoubleClick={(_, node) => {
          const item = itemOfNodeId(node.id);
          if (item?.kind === "part") window.dispatchEvent(new CustomEvent(FOCUS_SHEET_EVENT));
        }}
        onPaneClick={() => {
          store.getState().clearSelection();
          surface.current?.focus();
        }}
        connectionMode={ConnectionMode.Loose}
        connectionLineType={ConnectionLineType.Step}
        snapToGrid
        snapGrid={[GRID, GRID]}
        nodesDraggable={!readOnly}
        nodesConnectable={!readOnly}
        elementsSelectable
        deleteKeyCode={null}
        selectionKeyCode="Shift"
        multiSelectionKeyCode={["Shift", "Meta", "Control"]}
        onInit={() => setFlowReady(true)}
        minZoom={0.2}
        maxZoom={3}
        proOptions={{ hideAttribution: true }}
      >
        <Background variant={BackgroundVariant.Dots} gap={GRID} size={1} color="var(--color-rule)" />
        <Controls showInteractive={false} showFitView={false} position="bottom-right" aria-label="Zoom">
          <ControlButton
            className="react-flow__controls-fitview"
            onClick={fitDrawing}
            title="Zoom to fit (F)"
            aria-label="Zoom to fit"
          >
            <FitIcon />
          </ControlButton>
        </Controls>
      </ReactFlow>
      {netError && (
        <div
          role="alert"
          className="pointer-events-none absolute bottom-12 left-3 right-16 z-10 rounded border border-caution bg-caution-bg px-3 py-2 text-sm text-caution"
        >
          <span className="font-mono">Net {netError.net}:</span> {netError.message}
        </div>
      )}
      {document.circuit.parts.length === 0 && (
        <p className="pointer-events-none absolute inset-x-0 top-1/3 text-center text-sm text-ink-soft">
          {readOnly ? "This design has no parts yet." : "Drag a part from the tray, or click one to place it here."}
        </p>
      )}
      <button
        type="button"
        onClick={() => setHelp(true)}
        className="absolute left-3 bottom-3 z-10 rounded border border-rule bg-paper px-2 py-1 text-xs text-ink-soft hover:bg-paper-deep"
        aria-label="Keyboard shortcuts"
      >
        ? Shortcuts
      </button>
      {help && <HelpOverlay onClose={() => setHelp(false)} />}
    </section>
  );
}
