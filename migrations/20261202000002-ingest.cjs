"use strict";
// Historian data in: uploaded files, saved mappings, organization API keys, the
// time-series table `samples` and its 15-minute rollup `samples_15m`.
//
// samples (well_id, signal, t, v) is declared RANGE-partitioned by t, one partition
// per calendar month (UTC), plus a DEFAULT partition so a write is never refused.
// Why monthly: at ~6 M values/day a month is ~180 M rows (~16 GB with its index);
// a 90-day trend touches 3–4 partitions, and old months can be detached or dropped
// whole. The ingest path calls bellows_ensure_sample_partitions(from, to) before it
// writes, so the DEFAULT partition normally stays empty (and creating a partition,
// which must scan DEFAULT for rows of its range, stays cheap). When DEFAULT does
// hold rows of a new month the function moves them into the new partition.
//
// Indexes: only the primary key (well_id, signal, t). Every read we have (a trend of
// one well and signal over a time range, the rollup recompute, the diagnose look-back)
// is a prefix-plus-range on it. Measured here (2 cores, a busy machine, so rough):
// COPY of 165 000 key-ordered values into a table keyed like this one took 0.9–1.4 s
// with the key alone, 1.4 s with a second index on (t), and 4.7 s with a foreign key
// to wells (a look-up per row). No query uses a (t) index, so there is none; there is
// no foreign key either: the writer only writes well ids it resolved inside the
// organization. Whatever deletes a well must delete its samples and samples_15m rows
// too (there is no cascade).
//
// samples_15m holds per (well, signal, 15-minute bucket): count, min, max, sum, first
// and last value. The ingest path recomputes the touched buckets from samples in the
// same transaction as the upsert, so the rollup is idempotent and never drifts.

const PARTITION_FUNCTIONS = `
CREATE OR REPLACE FUNCTION bellows_sample_partition_name(month_start timestamptz)
RETURNS text LANGUAGE sql IMMUTABLE AS $$
  SELECT 'samples_' || to_char(month_start AT TIME ZONE 'UTC', 'YYYY"m"MM')
$$;

-- Create the monthly partition holding ts if it does not exist yet. Safe to call
-- from several sessions at once (a transaction-scoped advisory lock serialises the
-- creators). Rows of that month already in DEFAULT are moved into it first.
CREATE OR REPLACE FUNCTION bellows_ensure_sample_partition(ts timestamptz)
RETURNS text LANGUAGE plpgsql AS $$
DECLARE
  lo timestamptz := date_trunc('month', ts AT TIME ZONE 'UTC') AT TIME ZONE 'UTC';
  hi timestamptz := (date_trunc('month', ts AT TIME ZONE 'UTC') + interval '1 month') AT TIME ZONE 'UTC';
  part text := bellows_sample_partition_name(lo);
  moved bigint;
BEGIN
  IF to_regclass(part) IS NOT NULL THEN RETURN part; END IF;
  PERFORM pg_advisory_xact_lock(hashtext('bellows_samples_partition'));
  IF to_regclass(part) IS NOT NULL THEN RETURN part; END IF;
  SELECT count(*) INTO moved FROM samples_default WHERE t >= lo AND t < hi;
  IF moved = 0 THEN
    EXECUTE format('CREATE TABLE %I PARTITION OF samples FOR VALUES FROM (%L) TO (%L)', part, lo, hi);
  ELSE
    EXECUTE format('CREATE TABLE %I (LIKE samples INCLUDING DEFAULTS)', part);
    EXECUTE format('WITH m AS (DELETE FROM samples_default WHERE t >= %L AND t < %L RETURNING *) INSERT INTO %I SELECT * FROM m', lo, hi, part);
    EXECUTE format('ALTER TABLE %I ADD PRIMARY KEY (well_id, signal, t)', part);
    EXECUTE format('ALTER TABLE samples ATTACH PARTITION %I FOR VALUES FROM (%L) TO (%L)', part, lo, hi);
  END IF;
  RETURN part;
END
$$;

-- Every month from a to b (inclusive). Times outside 1970–2200 are left to DEFAULT.
CREATE OR REPLACE FUNCTION bellows_ensure_sample_partitions(a timestamptz, b timestamptz)
RETURNS integer LANGUAGE plpgsql AS $$
DECLARE
  m timestamptz := date_trunc('month', greatest(a, '1970-01-01Z') AT TIME ZONE 'UTC') AT TIME ZONE 'UTC';
  stop timestamptz := least(b, '2200-01-01Z');
  n integer := 0;
BEGIN
  WHILE m <= stop LOOP
    PERFORM bellows_ensure_sample_partition(m);
    n := n + 1;
    m := m + interval '1 month';
  END LOOP;
  RETURN n;
END
$$;
`;

/** @type {import('sequelize-cli').Migration} */
module.exports = {
  async up(queryInterface, Sequelize) {
    const { DataTypes } = Sequelize;
    const q = (sql) => queryInterface.sequelize.query(sql);
    const stamps = {
      created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: Sequelize.fn("now") },
      updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: Sequelize.fn("now") },
    };
    const orgRef = {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: "organizations", key: "id" },
      onDelete: "CASCADE",
    };
    const userRef = { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" };

    await queryInterface.createTable("mappings", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: orgRef,
      name: { type: DataTypes.STRING(120), allowNull: false },
      header_shape: { type: DataTypes.STRING(128), allowNull: false },
      layout: { type: DataTypes.ENUM("long", "wide"), allowNull: false },
      definition: { type: DataTypes.JSONB, allowNull: false },
      ...stamps,
    });
    await queryInterface.addIndex("mappings", ["organization_id", "name"], { unique: true });
    await queryInterface.addIndex("mappings", ["organization_id", "header_shape"]);

    await queryInterface.createTable("api_keys", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: orgRef,
      name: { type: DataTypes.STRING(120), allowNull: false },
      prefix: { type: DataTypes.STRING(16), allowNull: false },
      key_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      created_by: userRef,
      last_used_at: { type: DataTypes.DATE, allowNull: true },
      revoked_at: { type: DataTypes.DATE, allowNull: true },
      ...stamps,
    });
    await queryInterface.addIndex("api_keys", ["organization_id"]);

    await queryInterface.createTable("uploads", {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      organization_id: orgRef,
      created_by: userRef,
      api_key_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "api_keys", key: "id" }, onDelete: "SET NULL" },
      source: { type: DataTypes.ENUM("browser", "api"), allowNull: false },
      file_name: { type: DataTypes.STRING(255), allowNull: false },
      storage_key: { type: DataTypes.STRING(400), allowNull: false },
      byte_size: { type: DataTypes.BIGINT, allowNull: false },
      sha256: { type: DataTypes.STRING(64), allowNull: false },
      // "refused": detection turned the file down (the message is in `error`).
      status: { type: DataTypes.ENUM("received", "refused", "queued", "processing", "done", "failed"), allowNull: false },
      detection: { type: DataTypes.JSONB, allowNull: true },
      mapping: { type: DataTypes.JSONB, allowNull: true },
      mapping_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "mappings", key: "id" }, onDelete: "SET NULL" },
      // File well key → registered well id, as confirmed on submit.
      well_matches: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      progress: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      bytes_processed: { type: DataTypes.BIGINT, allowNull: false, defaultValue: 0 },
      counts: { type: DataTypes.JSONB, allowNull: true },
      error: { type: DataTypes.TEXT, allowNull: true },
      rejections_key: { type: DataTypes.STRING(400), allowNull: true },
      started_at: { type: DataTypes.DATE, allowNull: true },
      finished_at: { type: DataTypes.DATE, allowNull: true },
      ...stamps,
    });
    await q(`ALTER TABLE uploads ADD CONSTRAINT uploads_progress_range CHECK (progress >= 0 AND progress <= 1)`);
    await queryInterface.addIndex("uploads", ["organization_id", "created_at"]);
    await queryInterface.addIndex("uploads", ["status", "updated_at"]);

    await q(`
      CREATE TABLE samples (
        well_id integer NOT NULL,
        signal smallint NOT NULL,
        t timestamptz NOT NULL,
        v double precision NOT NULL,
        PRIMARY KEY (well_id, signal, t)
      ) PARTITION BY RANGE (t)`);
    await q(`CREATE TABLE samples_default PARTITION OF samples DEFAULT`);
    await q(PARTITION_FUNCTIONS);

    await q(`
      CREATE TABLE samples_15m (
        well_id integer NOT NULL,
        signal smallint NOT NULL,
        bucket timestamptz NOT NULL,
        n integer NOT NULL,
        vmin double precision NOT NULL,
        vmax double precision NOT NULL,
        vsum double precision NOT NULL,
        vfirst double precision NOT NULL,
        vlast double precision NOT NULL,
        PRIMARY KEY (well_id, signal, bucket)
      )`);
  },

  async down(queryInterface) {
    const q = (sql) => queryInterface.sequelize.query(sql);
    await q(`DROP TABLE IF EXISTS samples_15m`);
    await q(`DROP TABLE IF EXISTS samples CASCADE`); // partitions go with their parent
    await q(`DROP FUNCTION IF EXISTS bellows_ensure_sample_partitions(timestamptz, timestamptz)`);
    await q(`DROP FUNCTION IF EXISTS bellows_ensure_sample_partition(timestamptz)`);
    await q(`DROP FUNCTION IF EXISTS bellows_sample_partition_name(timestamptz)`);
    for (const t of ["uploads", "api_keys", "mappings"]) await queryInterface.dropTable(t);
    for (const e of ["enum_uploads_source", "enum_uploads_status", "enum_mappings_layout"]) {
      await q(`DROP TYPE IF EXISTS "${e}"`);
    }
  },
};
