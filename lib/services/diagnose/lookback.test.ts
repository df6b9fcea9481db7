// Where a diagnosis run's data starts (regression checks of our own rule).
import { describe, expect, it } from "vitest";
import { dataStart, MIN_LOOKBACK_MS } from "./lookback";

const DAY = 86_400_000;

describe("dataStart", () => {
  it("goes back the look-back, then to midnight UTC of that day", () => {
    const from = Date.UTC(2026, 10, 30, 12, 37, 15);
    expect(dataStart(from, MIN_LOOKBACK_MS)).toBe(Date.UTC(2026, 10, 27));
  });
  it("gives runs starting at any time of one day the same start", () => {
    const day = Date.UTC(2026, 10, 30);
    const starts = [0, 1, 3_600_000 * 7 + 13 * 60_000, DAY - 1].map((ms) => dataStart(day + ms, MIN_LOOKBACK_MS));
    expect(new Set(starts).size).toBe(1);
  });
  it("keeps a start already at midnight", () => {
    expect(dataStart(Date.UTC(2026, 0, 10), 3 * DAY)).toBe(Date.UTC(2026, 0, 7));
  });
});
