import { describe, expect, it } from "vitest";
import { commandOfKey, SHORTCUTS } from "./shortcuts";

const press = (key: string, mods: Partial<{ ctrlKey: boolean; metaKey: boolean; shiftKey: boolean; altKey: boolean }> = {}) =>
  commandOfKey({ key, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...mods });

describe("bench shortcuts", () => {
  it("maps the listed keys to their commands", () => {
    expect(press("r")).toBe("rotate");
    expect(press("R", { shiftKey: true })).toBe("rotate");
    expect(press("Delete")).toBe("delete");
    expect(press("Backspace")).toBe("delete");
    expect(press("z", { ctrlKey: true })).toBe("undo");
    expect(press("Z", { ctrlKey: true, shiftKey: true })).toBe("redo");
    expect(press("y", { metaKey: true })).toBe("redo");
    expect(press("c", { ctrlKey: true })).toBe("copy");
    expect(press("v", { ctrlKey: true })).toBe("paste");
    expect(press("?", { shiftKey: true })).toBe("help");
    expect(press("f")).toBe("fit");
  });
  it("ignores other keys and browser chords", () => {
    expect(press("x")).toBeNull();
    expect(press("r", { ctrlKey: true })).toBeNull();
    expect(press("r", { altKey: true })).toBeNull();
  });
  it("lists every command in the help overlay", () => {
    const commands = new Set(SHORTCUTS.map((s) => s.command));
    for (const c of ["rotate", "delete", "copy", "paste", "undo", "redo", "fit", "help"]) expect(commands.has(c as never)).toBe(true);
  });
});
