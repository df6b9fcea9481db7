// Every foundation service refuses a user of another organization (404, as if
// the row did not exist) and a role without the right (403).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { makeOrg, closeDb, WELL_INPUT, type TestOrg } from "../helpers";
import { getWell } from "@/lib/services/wells/get-well";
import { listWells } from "@/lib/services/wells/list-wells";
import { saveWell } from "@/lib/services/wells/save-well";
import { saveValveString } from "@/lib/services/wells/save-valve-string";
import { listFieldTree } from "@/lib/services/wells/list-field-tree";
import { createField, createPad } from "@/lib/services/wells/save-field-or-pad";
import { importRegisterCsv } from "@/lib/services/wells/import-register-csv";
import { inviteUser } from "@/lib/services/users/invite-user";
import { listUsers } from "@/lib/services/users/list-users";
import { updateUser } from "@/lib/services/users/update-user";
import { AppError } from "@/lib/errors";
import type { Role } from "@/lib/auth/roles";

let a: TestOrg;
let b: TestOrg;

beforeAll(async () => {
  a = await makeOrg("iso-a");
  b = await makeOrg("iso-b");
});
afterAll(closeDb);

async function codeOf(p: Promise<unknown>): Promise<string> {
  try {
    await p;
    return "ok";
  } catch (e) {
    if (e instanceof AppError) return e.code;
    throw e;
  }
}

const VALVES = [
  { position: 1, mdFt: 2500, tvdFt: 2500, kind: "ipo", portIn: 0.1875, valveOdIn: 1.5, rRatio: null, tropsig: 980 },
  { position: 2, mdFt: 4200, tvdFt: 4200, kind: "ipo", portIn: 0.1875, valveOdIn: 1.5, rRatio: null, tropsig: 955 },
  { position: 3, mdFt: 6000, tvdFt: 6000, kind: "orifice", portIn: 0.25, valveOdIn: null, rRatio: null, tropsig: null },
];

describe("another organization's user gets not_found, never the data", () => {
  it.each<[string, (t: TestOrg) => Promise<unknown>]>([
    ["getWell", (t) => getWell(t.actors.admin, a.wellId)],
    ["saveWell (update)", (t) => saveWell(t.actors.admin, { ...WELL_INPUT, padId: t.padId }, a.wellId)],
    ["saveValveString", (t) => saveValveString(t.actors.admin, a.wellId, VALVES)],
    ["updateUser", (t) => updateUser(t.actors.admin, a.actors.analyst.userId!, { role: "admin" })],
  ])("%s", async (_name, call) => {
    expect(await codeOf(call(b))).toBe("not_found");
  });

  it("saveWell cannot place a well on another organization's pad", async () => {
    expect(await codeOf(saveWell(b.actors.admin, { ...WELL_INPUT, uwi: "X-1", padId: a.padId }))).toBe("invalid");
  });

  it("createPad cannot use another organization's field", async () => {
    expect(await codeOf(createPad(b.actors.admin, { name: "Sneaky", fieldId: a.fieldId }))).toBe("invalid");
  });

  it("lists show only the actor's organization", async () => {
    const wells = await listWells(b.actors.engineer, {});
    expect(wells.map((w) => w.id)).not.toContain(a.wellId);
    const tree = await listFieldTree(b.actors.operator);
    expect(tree.map((f) => f.id)).not.toContain(a.fieldId);
    const users = await listUsers(b.actors.admin);
    expect(users.every((u) => !u.email.includes("iso-a"))).toBe(true);
  });

  it("valve import cannot reach another organization's well by identifier", async () => {
    const csv = `uwi,position,md_ft,tvd_ft,kind,port_in,valve_od_in,r_ratio,tro_psig\n${WELL_INPUT.uwi}-nope,1,2500,2500,ipo,0.1875,1.5,,980\n`;
    const r = await importRegisterCsv(b.actors.analyst, { text: csv, apply: true });
    expect(r.errors[0]?.message).toMatch(/No well/);
  });
});

describe("roles without the right are refused (forbidden)", () => {
  const cases: [string, Role[], (t: TestOrg, r: Role) => Promise<unknown>][] = [
    ["saveWell", ["operator"], (t, r) => saveWell(t.actors[r], { ...WELL_INPUT, uwi: `R-${r}`, padId: t.padId })],
    ["saveValveString", ["operator"], (t, r) => saveValveString(t.actors[r], t.wellId, VALVES)],
    ["createField", ["operator"], (t, r) => createField(t.actors[r], { name: `F ${r}`, timeZone: "UTC" })],
    ["importRegisterCsv", ["operator"], (t, r) => importRegisterCsv(t.actors[r], { text: "a,b\n1,2\n" })],
    ["inviteUser", ["analyst", "engineer", "operator"], (t, r) => inviteUser(t.actors[r], { email: `x.${r}@test.invalid`, name: "X", role: "operator" })],
    ["listUsers", ["analyst", "engineer", "operator"], (t, r) => listUsers(t.actors[r])],
    ["updateUser", ["analyst", "engineer", "operator"], (t, r) => updateUser(t.actors[r], t.actors.operator.userId!, { active: false })],
  ];
  for (const [name, denied, call] of cases) {
    for (const role of denied) {
      it(`${name} refuses ${role}`, async () => {
        expect(await codeOf(call(a, role))).toBe("forbidden");
      });
    }
  }

  it("roles with the right may edit the register", async () => {
    for (const role of ["admin", "analyst", "engineer"] as const) {
      const id = await saveWell(a.actors[role], { ...WELL_INPUT, uwi: `OK-${role}`, padId: a.padId });
      expect((await getWell(a.actors.operator, id)).uwi).toBe(`OK-${role}`);
    }
    await saveValveString(a.actors.analyst, a.wellId, VALVES);
    expect((await getWell(a.actors.operator, a.wellId)).mandrels).toHaveLength(3);
  });
});
