import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from "sequelize";
import { sequelize } from "./connection";

export type UploadStatus = "received" | "refused" | "queued" | "processing" | "done" | "failed";
export type UploadSource = "browser" | "api";

/** Counts written by the ingest worker when it finishes (and while it runs). */
export interface UploadCountsJson {
  rowsRead: number;
  valuesStored: number;
  duplicatesMerged: number;
  rejectedByReason: Record<string, number>;
  /** Per well id (as text): first and last accepted time, ISO. */
  spans: Record<string, { from: string; to: string }>;
}

export class Upload extends Model<InferAttributes<Upload>, InferCreationAttributes<Upload>> {
  declare id: CreationOptional<number>;
  declare organization_id: number;
  declare created_by: number | null;
  declare api_key_id: number | null;
  declare source: UploadSource;
  declare file_name: string;
  declare storage_key: string;
  /** BIGINT comes back from pg as a string. */
  declare byte_size: number | string;
  declare sha256: string;
  declare status: UploadStatus;
  declare detection: unknown;
  declare mapping: unknown;
  declare mapping_id: number | null;
  declare well_matches: CreationOptional<Record<string, number>>;
  declare progress: CreationOptional<number>;
  declare bytes_processed: CreationOptional<number | string>;
  declare counts: UploadCountsJson | null;
  declare error: string | null;
  declare rejections_key: string | null;
  declare started_at: Date | null;
  declare finished_at: Date | null;
  declare created_at: CreationOptional<Date>;
  declare updated_at: CreationOptional<Date>;
}

Upload.init(
  {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    organization_id: { type: DataTypes.INTEGER, allowNull: false },
    created_by: { type: DataTypes.INTEGER, allowNull: true },
    api_key_id: { type: DataTypes.INTEGER, allowNull: true },
    source: { type: DataTypes.ENUM("browser", "api"), allowNull: false },
    file_name: { type: DataTypes.STRING(255), allowNull: false },
    storage_key: { type: DataTypes.STRING(400), allowNull: false },
    byte_size: { type: DataTypes.BIGINT, allowNull: false },
    sha256: { type: DataTypes.STRING(64), allowNull: false },
    status: { type: DataTypes.ENUM("received", "refused", "queued", "processing", "done", "failed"), allowNull: false },
    detection: { type: DataTypes.JSONB, allowNull: true },
    mapping: { type: DataTypes.JSONB, allowNull: true },
    mapping_id: { type: DataTypes.INTEGER, allowNull: true },
    well_matches: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    progress: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
    bytes_processed: { type: DataTypes.BIGINT, allowNull: false, defaultValue: 0 },
    counts: { type: DataTypes.JSONB, allowNull: true },
    error: { type: DataTypes.TEXT, allowNull: true },
    rejections_key: { type: DataTypes.STRING(400), allowNull: true },
    started_at: { type: DataTypes.DATE, allowNull: true },
    finished_at: { type: DataTypes.DATE, allowNull: true },
    created_at: DataTypes.DATE,
    updated_at: DataTypes.DATE,
  },
  { sequelize, modelName: "Upload", tableName: "uploads" },
);
