// Test organizations with one person per role, made fresh for each file.
import { Field, Organization, Pad, User, Well, sequelize } from "@/models";
import type { Actor } from "@/lib/auth/actor";
import type { Role } from "@/lib/auth/roles";
import { ROLES } from "@/lib/auth/roles";

export interface TestOrg {
  organizationId: number;
  actors: Record<Role, Actor>;
  fieldId: number;
  padId: number;
  wellId: number;
}

let counter = 0;

export const WELL_INPUT = {
  name: "Test Well 1",
  uwi: "T-0001",
  status: "producing",
  timeZone: "America/Chicago",
  tubingIdIn: 1.995,
  tubingDepthFt: 7800,
  perfDepthFt: 8000,
  surfaceTempF: 80,
  bottomholeTempF: 190,
  gasSg: 0.68,
  liquidType: "oil",
  liquidGravity: 38,
  waterCut: 0.4,
  reservoirPressurePsig: 2400,
  injectionPressurePsig: 1150,
} as const;

export async function makeOrg(label: string): Promise<TestOrg> {
  const tag = `${label}-${process.pid}-${Date.now()}-${counter++}`;
  const org = await Organization.create({ name: `Test ${tag}`, slug: tag.slice(0, 60), settings: {} });
  const actors = {} as Record<Role, Actor>;
  for (const role of ROLES) {
    const u = await User.create({ organization_id: org.id, email: `${role}.${tag}@test.invalid`, name: `${role} ${tag}`, role, password_hash: null });
    actors[role] = { userId: u.id, organizationId: org.id, role };
  }
  const field = await Field.create({ organization_id: org.id, name: `Field ${tag}`, time_zone: "America/Chicago" });
  const pad = await Pad.create({ organization_id: org.id, field_id: field.id, name: `Pad ${tag}` });
  const well = await Well.create({
    organization_id: org.id,
    pad_id: pad.id,
    name: WELL_INPUT.name,
    uwi: WELL_INPUT.uwi,
    time_zone: "America/Chicago",
    tubing_id_in: 1.995,
    tubing_depth_ft: 7800,
    perf_depth_ft: 8000,
    surface_temp_f: 80,
    bottomhole_temp_f: 190,
    gas_sg: 0.68,
    liquid_type: "oil",
    liquid_gravity: 38,
    water_cut: 0.4,
    reservoir_pressure_psig: 2400,
    injection_pressure_psig: 1150,
  });
  return { organizationId: org.id, actors, fieldId: field.id, padId: pad.id, wellId: well.id };
}

export async function closeDb() {
  await sequelize.close();
}
