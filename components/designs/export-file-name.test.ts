import { describe, expect, it } from "vitest";
import { exportFileName } from "./export-file-name";

describe("exportFileName", () => {
  it("is <title>-r<n>.json", () => {
    expect(exportFileName("LA-47 follower", 3)).toEqual({ ascii: "LA-47 follower-r3.json", utf8: "LA-47%20follower-r3.json" });
  });
  it("drops characters that would break the header or a path, keeping them in the UTF-8 form", () => {
    const { ascii, utf8 } = exportFileName('Bias "hot" / 60 V · Ω', 2);
    expect(ascii).toBe("Bias -hot- - 60 V -r2.json");
    expect(decodeURIComponent(utf8)).toBe('Bias "hot" / 60 V · Ω-r2.json');
  });
});
