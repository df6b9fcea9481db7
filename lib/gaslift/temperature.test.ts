import { describe, expect, it } from "vitest";
import { temperatureAtDepth } from "./temperature";

// A straight geothermal line (common practice); the expected values are arithmetic.
describe("linear temperature profile (common practice)", () => {
  it.each([
    [0, 80],
    [4000, 140],
    [8000, 200],
    [-50, 80],
    [9000, 215],
  ])("at %s ft TVD it is %s °F between 80 °F at surface and 200 °F at 8,000 ft", (depth, expected) => {
    expect(temperatureAtDepth(80, 200, 8000, depth)).toBeCloseTo(expected, 9);
  });

  it("rejects a profile with no bottom depth", () => {
    expect(() => temperatureAtDepth(80, 200, 0, 100)).toThrow(RangeError);
  });
});
