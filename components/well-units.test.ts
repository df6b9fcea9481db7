import { describe, expect, it } from "vitest";
import {
  formatDiameter, formatLength, formatPort, formatPressure, formatPressureDelta, formatTemperature, formatUpdated, formatValveSize,
} from "./well-units";

// Conversion factors: NIST SP 811 (2008), Appendix B.8/B.9 [published]:
// 1 ft = 0.3048 m (exact), 1 in = 25.4 mm (exact), 1 psi = 6.894 757 kPa,
// t/°C = (t/°F − 32)/1.8. The expected strings are those values rounded as the
// register shows them.
describe("well register display units", () => {
  const cases: { name: string; got: string; want: string }[] = [
    { name: "length, oilfield: ft as stored", got: formatLength(7800, "oilfield"), want: "7,800" },
    { name: "length, metric: 1,000 ft = 304.8 m [published, NIST SP 811]", got: formatLength(1000, "metric"), want: "304.8" },
    { name: "pressure, oilfield: psig as stored", got: formatPressure(1100.4, "oilfield"), want: "1,100" },
    { name: "pressure, metric: 100 psig = 689.5 kPag, shown 689 [published, NIST SP 811]", got: formatPressure(100, "metric"), want: "689" },
    { name: "pressure difference, metric: 20 psi = 137.9 kPa [published, NIST SP 811]", got: formatPressureDelta(20, "metric"), want: "138" },
    { name: "temperature, metric: 212 °F = 100 °C [published, NIST SP 811]", got: formatTemperature(212, "metric"), want: "100.0" },
    { name: "temperature, metric: 32 °F = 0 °C [published, NIST SP 811]", got: formatTemperature(32, "metric"), want: "0.0" },
    { name: "diameter, metric: 1.995 in = 50.673 mm [published, NIST SP 811]", got: formatDiameter(1.995, "metric"), want: "50.7" },
    { name: "diameter, oilfield: three decimals, as tubing IDs are quoted", got: formatDiameter(2.441, "oilfield"), want: "2.441" },
    { name: "valve size, oilfield: 1.5 in as named", got: formatValveSize(1.5, "oilfield"), want: "1.5" },
    { name: "port, oilfield: 1/4 in is 16/64 [practice: ports named in 64ths]", got: formatPort(0.25, "oilfield"), want: "0.250 (16/64)" },
    { name: "port, oilfield: an odd size shows the nearest 64th as approximate", got: formatPort(0.26, "oilfield"), want: "0.260 (≈17/64)" },
    { name: "port, metric: 3/16 in = 4.7625 mm [published, NIST SP 811]", got: formatPort(0.1875, "metric"), want: "4.8" },
    { name: "missing value", got: formatPressure(null, "metric"), want: "—" },
    { name: "timestamp in UTC", got: formatUpdated("2026-03-04T05:06:07.000Z"), want: "2026-03-04 05:06 UTC" },
    { name: "bad timestamp", got: formatUpdated("not a date"), want: "—" },
  ];
  it.each(cases)("$name", ({ got, want }) => {
    expect(got).toBe(want);
  });
});
