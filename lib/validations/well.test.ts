// The register's zod schemas: the same rules the form and the server apply.
import { describe, expect, it } from "vitest";
import { MandrelSchema, ValveStringSchema, WellSchema } from "./well";
import { parseRegisterCsv } from "./register-csv";

const well = {
  name: "Example 1", uwi: "EX-1", padId: 1, status: "producing", timeZone: "America/Chicago",
  tubingIdIn: 1.995, tubingDepthFt: 7800, perfDepthFt: 8000, surfaceTempF: 80, bottomholeTempF: 190,
  gasSg: 0.68, liquidType: "oil", liquidGravity: 38, waterCut: 0.4, reservoirPressurePsig: 2400, injectionPressurePsig: 1150,
};

const messages = (r: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  r.error?.issues.map((i) => `${i.path.join(".")}: ${i.message}`) ?? [];

describe("WellSchema", () => {
  it("accepts a plausible completion", () => expect(WellSchema.safeParse(well).success).toBe(true));
  it.each([
    [{ tubingIdIn: 12 }, "tubingIdIn: Tubing inner diameter must be between 0.8 and 7 in"],
    [{ timeZone: "Mars/Olympus" }, "timeZone: Unknown time zone"],
    [{ bottomholeTempF: 70 }, "bottomholeTempF: Bottom-hole temperature must be above surface temperature"],
    [{ waterCut: 1.5 }, "waterCut: Water cut must be between 0 and 1"],
    [{ uwi: "bad id!" }, "uwi: Use letters, digits"],
  ])("refuses %o with a message naming the field", (patch, expected) => {
    const r = WellSchema.safeParse({ ...well, ...patch });
    expect(r.success).toBe(false);
    expect(messages(r).join("\n")).toContain(expected);
  });
});

describe("ValveStringSchema", () => {
  const m = (position: number, mdFt: number, kind = "ipo") => ({ position, mdFt, tvdFt: mdFt, kind, portIn: 0.1875, valveOdIn: kind === "ipo" ? 1.5 : null, rRatio: null, tropsig: kind === "ipo" ? 950 : null });
  it("accepts depths increasing top to bottom", () => {
    expect(ValveStringSchema.safeParse([m(1, 2500), m(2, 4000), m(3, 5500, "orifice")]).success).toBe(true);
  });
  it("refuses a mandrel shallower than the one above", () => {
    expect(messages(ValveStringSchema.safeParse([m(1, 2500), m(2, 2400)])).join()).toContain("Mandrel 2 must be deeper than mandrel 1");
  });
  it("needs the test-rack opening pressure for an unloading valve", () => {
    expect(messages(MandrelSchema.safeParse({ ...m(1, 2500), tropsig: "" })).join()).toContain("tropsig: An unloading valve needs its test-rack opening pressure");
  });
});

describe("parseRegisterCsv", () => {
  it("names the row and column of a bad cell", () => {
    const csv = "uwi,position,md_ft,tvd_ft,kind,port_in,valve_od_in,r_ratio,tro_psig\nEX-1,1,2500,2500,ipo,0.1875,1.5,,950\nEX-1,2,4000,4000,bogus,0.1875,1.5,,930\n";
    const r = parseRegisterCsv(csv, "valves.csv");
    expect(r.kind).toBe("valves");
    expect(r.rows).toHaveLength(1);
    expect(r.errors).toEqual([{ row: 3, column: "kind", message: "Valve kind must be ipo, orifice or dummy", key: "EX-1" }]);
  });
  it("refuses a file whose header is neither kind", () => {
    expect(parseRegisterCsv("a,b\n1,2\n", "x.csv").errors[0].message).toMatch(/x.csv: the header must name/);
  });
});
