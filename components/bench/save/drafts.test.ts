import { describe, expect, it } from "vitest";
import { openDocument } from "../document/document";
import { draftKey, readDraft, removeDraft, writeDraft } from "./drafts";

function memoryStorage() {
  const map = new Map<string, string>();
  return {
    getItem: (k: string) => map.get(k) ?? null,
    setItem: (k: string, v: string) => void map.set(k, v),
    removeItem: (k: string) => void map.delete(k),
  };
}

describe("local drafts", () => {
  const document = openDocument({
    format: "backplate/circuit",
    version: 1,
    parts: [{ id: "R1", kind: "resistor", pins: { a: "x", b: "0" }, values: { resistance: "1k" } }],
    output: { plus: "x", minus: "0" },
  });

  it("keys drafts by design and parent revision", () => {
    expect(draftKey("d1", "r1")).not.toBe(draftKey("d1", "r2"));
    expect(draftKey("d1", null)).toBe("backplate:draft:d1:none");
  });

  it("writes, reads back and removes a draft", () => {
    const store = memoryStorage();
    const key = draftKey("d1", "r1");
    expect(writeDraft(key, { document, savedAt: "2026-12-01T10:00:00.000Z" }, store)).toBe(true);
    expect(readDraft(key, store)?.document).toEqual(document);
    removeDraft(key, store);
    expect(readDraft(key, store)).toBeNull();
  });

  it("ignores a damaged draft instead of failing", () => {
    const store = memoryStorage();
    store.setItem("k", "{not json");
    expect(readDraft("k", store)).toBeNull();
    store.setItem("k", JSON.stringify({ savedAt: "x" }));
    expect(readDraft("k", store)).toBeNull();
  });
});
