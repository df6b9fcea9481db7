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
import { Upload } from "./upload";
import { SavedMapping } from "./saved-mapping";
import { ApiKey } from "./api-key";
import { Issue } from "./issue";
import { IssueEvent } from "./issue-event";
import { IssueComment } from "./issue-comment";
import { IssueAttachment } from "./issue-attachment";
import { FieldEvent } from "./field-event";
import { RuleSetting } from "./rule-setting";
import { DiagnoseRun } from "./diagnose-run";
import { Notification } from "./notification";
import { SavedFilter } from "./saved-filter";

{
  Field.hasMany(Pad, { foreignKey: "field_id", as: "pads" });
  Pad.belongsTo(Field, { foreignKey: "field_id", as: "field" });
  Pad.hasMany(Well, { foreignKey: "pad_id", as: "wells" });
  Well.belongsTo(Pad, { foreignKey: "pad_id", as: "pad" });
  Well.hasMany(Mandrel, { foreignKey: "well_id", as: "mandrels" });
  Mandrel.belongsTo(Well, { foreignKey: "well_id", as: "well" });
  User.belongsTo(Organization, { foreignKey: "organization_id", as: "organization" });
  AuditLog.belongsTo(User, { foreignKey: "user_id", as: "user" });
  Issue.belongsTo(Well, { foreignKey: "well_id", as: "well" });
  Well.hasMany(Issue, { foreignKey: "well_id", as: "issues" });
  Issue.belongsTo(User, { foreignKey: "assignee_id", as: "assignee" });
  Issue.hasMany(IssueEvent, { foreignKey: "issue_id", as: "events" });
  IssueEvent.belongsTo(User, { foreignKey: "user_id", as: "user" });
  Issue.hasMany(IssueComment, { foreignKey: "issue_id", as: "comments" });
  IssueComment.belongsTo(User, { foreignKey: "user_id", as: "user" });
  Issue.hasMany(IssueAttachment, { foreignKey: "issue_id", as: "attachments" });
  FieldEvent.belongsTo(Pad, { foreignKey: "pad_id", as: "pad" });
  Upload.belongsTo(User, { foreignKey: "created_by", as: "creator" });
  Upload.belongsTo(SavedMapping, { foreignKey: "mapping_id", as: "savedMapping" });
  Upload.belongsTo(ApiKey, { foreignKey: "api_key_id", as: "apiKey" });
}

export { sequelize, Organization, User, AuthToken, Field, Pad, Well, Mandrel, AuditLog };
export { Upload, SavedMapping, ApiKey };
export { Issue, IssueEvent, IssueComment, IssueAttachment, FieldEvent, RuleSetting, DiagnoseRun, Notification, SavedFilter };
