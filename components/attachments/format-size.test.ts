import { describe, expect, it } from "vitest";
import { formatSize } from "./format-size";

// SI prefixes for bytes (IEC 80000-13: kilo = 1000), worked by hand.
describe("formatSize", () => {
  it("keeps small files in bytes", () => {
    expect(formatSize(0)).toBe("0 B");
    expect(formatSize(999)).toBe("999 B");
  });
  it("uses kilo = 1000, not 1024", () => {
    expect(formatSize(1000)).toBe("1 kB");
    expect(formatSize(1024)).toBe("1.02 kB");
    expect(formatSize(15_360)).toBe("15.4 kB");
  });
  it("carries to the next prefix instead of writing 1000 kB", () => {
    expect(formatSize(999_600)).toBe("1 MB");
    expect(formatSize(20_000_000)).toBe("20 MB");
    expect(formatSize(123_456_789)).toBe("123 MB");
  });
});
