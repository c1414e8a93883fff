/** The bench's keyboard shortcuts: one list, read by the key handler and the help overlay. */

export type ShortcutCommand =
  | "rotate"
  | "delete"
  | "copy"
  | "paste"
  | "undo"
  | "redo"
  | "fit"
  | "help"
  | "ground"
  | "label"
  | "escape";

export interface Shortcut {
  command: ShortcutCommand;
  keys: string;
  does: string;
}

export const SHORTCUTS: Shortcut[] = [
  { command: "rotate", keys: "R", does: "Turn the selected parts a quarter turn" },
  { command: "delete", keys: "Del or Backspace", does: "Remove the selected parts, wires, grounds and labels" },
  { command: "copy", keys: "Ctrl+C", does: "Copy the selected parts" },
  { command: "paste", keys: "Ctrl+V", does: "Paste the copied parts" },
  { command: "undo", keys: "Ctrl+Z", does: "Undo" },
  { command: "redo", keys: "Ctrl+Shift+Z or Ctrl+Y", does: "Redo" },
  { command: "fit", keys: "F", does: "Zoom to fit the whole circuit" },
  { command: "ground", keys: "G", does: "Add a ground symbol at the centre" },
  { command: "label", keys: "N", does: "Add a net label at the centre" },
  { command: "help", keys: "?", does: "Show or hide this list" },
  { command: "escape", keys: "Esc", does: "Clear the selection, close this list" },
];

/** Extra gestures that are not single keys. */
export const GESTURES: { keys: string; does: string }[] = [
  { keys: "Drag from a pin to a pin", does: "Draw a wire (nets are the pins wires join)" },
  { keys: "Shift + drag on the canvas", does: "Select everything in a box" },
  { keys: "Shift + click", does: "Add to the selection" },
  { keys: "Tab / Shift+Tab", does: "Move between parts; Enter opens the part sheet" },
  { keys: "Drag a kind from the tray, or click it", does: "Add a part (a click places it at the centre)" },
];

/** The command a key press means on the canvas, or null. Typing in a field never reaches here. */
export function commandOfKey(event: {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  shiftKey: boolean;
  altKey: boolean;
}): ShortcutCommand | null {
  const mod = event.ctrlKey || event.metaKey;
  const key = event.key.length === 1 ? event.key.toLowerCase() : event.key;
  if (event.altKey) return null;
  if (mod && key === "z") return event.shiftKey ? "redo" : "undo";
  if (mod && key === "y") return "redo";
  if (mod && key === "c") return "copy";
  if (mod && key === "v") return "paste";
  if (mod) return null;
  if (key === "Delete" || key === "Backspace") return "delete";
  if (key === "?") return "help";
  if (key === "Escape") return "escape";
  if (key === "r") return "rotate";
  if (key === "f") return "fit";
  if (key === "g") return "ground";
  if (key === "n") return "label";
  return null;
}
