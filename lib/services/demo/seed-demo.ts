// The demo organization: an invented operator with two invented fields, six
// pads, 32 gas-lifted wells with valve strings from the synthetic scenario
// generator, and one person per role. Safe to run again: everything is found
// by its natural key and only created or brought back to the same values.
import bcrypt from "bcryptjs";
import { Field, Mandrel, Organization, Pad, User, Well, sequelize } from "@/models";
import { generateField, type GeneratedField } from "@/lib/scenario/field";
import { wellColumns, mandrelColumns } from "@/lib/services/wells/well-dto";
import type { Role } from "@/lib/auth/roles";

export const DEMO_PASSWORD = "bellows-demo";
export const DEMO_ORG_SLUG = "demo";
export const DEMO_DAYS = 14;

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: "admin@demo.bellows.test", name: "Ada Brightwater", role: "admin" },
  { email: "analyst@demo.bellows.test", name: "Tomas Reyle", role: "analyst" },
  { email: "engineer@demo.bellows.test", name: "Priya Ostrand", role: "engineer" },
  { email: "operator@demo.bellows.test", name: "Cal Dunmore", role: "operator" },
  { email: "operator2@demo.bellows.test", name: "Wren Hollis", role: "operator" },
];

const FIELDS = [
  { seed: 7101, timeZone: "America/Chicago", code: "A" },
  { seed: 7202, timeZone: "America/Denver", code: "B" },
];

export interface DemoField {
  fieldId: number;
  code: string;
  timeZone: string;
  generated: GeneratedField;
  /** Scenario well id (e.g. "w-1-2") → database well id. */
  wellIds: Map<string, number>;
}

/** The anchor (epoch ms, midnight UTC) is fixed at the first seed so later runs repeat it. */
async function demoAnchor(org: Organization): Promise<number> {
  const s = org.settings as { demoAnchor?: number };
  if (typeof s.demoAnchor === "number") return s.demoAnchor;
  const day = 86_400_000;
  const anchor = Math.floor(Date.now() / day) * day - DEMO_DAYS * day;
  await org.update({ settings: { ...org.settings, demoAnchor: anchor } });
  return anchor;
}

export async function seedDemo(): Promise<{ organizationId: number; fields: DemoField[]; anchor: number }> {
  const [org] = await Organization.findOrCreate({
    where: { slug: DEMO_ORG_SLUG },
    defaults: { name: "Kestrel Ridge Operating (demo)", slug: DEMO_ORG_SLUG, settings: {} },
  });
  const anchor = await demoAnchor(org);

  const hash = await bcrypt.hash(DEMO_PASSWORD, 10);
  for (const u of DEMO_USERS) {
    const existing = await User.findOne({ where: { email: u.email } });
    if (!existing) await User.create({ ...u, organization_id: org.id, password_hash: hash, active: true });
  }

  const fields: DemoField[] = [];
  for (const spec of FIELDS) {
    const generated = generateField({ seed: spec.seed, wells: 16, days: DEMO_DAYS, start: anchor, wellsPerPad: 6 });
    const wellIds = new Map<string, number>();
    const fieldId = await sequelize.transaction(async (transaction) => {
      const [field] = await Field.findOrCreate({
        where: { organization_id: org.id, name: generated.name },
        defaults: { organization_id: org.id, name: generated.name, time_zone: spec.timeZone },
        transaction,
      });
      for (const p of generated.pads) {
        const [pad] = await Pad.findOrCreate({
          where: { field_id: field.id, name: p.name },
          defaults: { organization_id: org.id, field_id: field.id, name: p.name },
          transaction,
        });
        for (const w of generated.wells.filter((x) => x.padId === p.padId)) {
          const uwi = `DEMO-${spec.code}${w.wellId.replace(/^w-/, "").replace("-", "")}`.toUpperCase();
          const cols = wellColumns({
            ...w.design,
            name: w.name,
            uwi,
            padId: pad.id,
            status: "producing",
            timeZone: spec.timeZone,
          });
          const [well, created] = await Well.findOrCreate({
            where: { organization_id: org.id, uwi },
            defaults: { ...cols, organization_id: org.id },
            transaction,
          });
          if (created) {
            await Mandrel.bulkCreate(
              w.design.mandrels.map((m) => ({ ...mandrelColumns(m), well_id: well.id, organization_id: org.id })),
              { transaction },
            );
          }
          wellIds.set(w.wellId, well.id);
        }
      }
      return field.id;
    });
    fields.push({ fieldId, code: spec.code, timeZone: spec.timeZone, generated, wellIds });
  }
  return { organizationId: org.id, fields, anchor };
}
