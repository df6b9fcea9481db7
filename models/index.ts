// Model registry and associations. Import models from here so the
// associations are always set up before use.
import { sequelize } from "./connection";
import { Organization } from "./organization";
import { User } from "./user";
import { AuthToken } from "./auth-token";
import { Field } from "./field";
import { Pad } from "./pad";
import { Well } from "./well";
import { Mandrel } from "./mandrel";
import { AuditLog } from "./audit-log";

{
  Field.hasMany(Pad, { foreignKey: "field_id", as: "pads" });
  Pad.belongsTo(Field, { foreignKey: "field_id", as: "field" });
  Pad.hasMany(Well, { foreignKey: "pad_id", as: "wells" });
  Well.belongsTo(Pad, { foreignKey: "pad_id", as: "pad" });
  Well.hasMany(Mandrel, { foreignKey: "well_id", as: "mandrels" });
  Mandrel.belongsTo(Well, { foreignKey: "well_id", as: "well" });
  User.belongsTo(Organization, { foreignKey: "organization_id", as: "organization" });
  AuditLog.belongsTo(User, { foreignKey: "user_id", as: "user" });
}

export { sequelize, Organization, User, AuthToken, Field, Pad, Well, Mandrel, AuditLog };
