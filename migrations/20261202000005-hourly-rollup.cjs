"use strict";
// samples_1h: an hourly rollup of samples_15m, for long chart ranges.
//
// Why: a 90-day chart at 1,200 px draws 3-hour min/max buckets. From samples_15m that
// is 12 rows per bucket (43,200 rows for five signals, ~100 ms of grouping per
// request, measured); from an hourly table it is 3 (10,800 rows, a few ms).
//
// Per (well, signal, hour): count, min, max, sum, first and last value, and the time
// of the minimum and of the maximum — the start of the earliest 15-minute bucket that
// holds each — so a chart bucket made of several hours can still tell whether its
// minimum came before its maximum (the same answer samples_15m gives, to the
// quarter hour).
//
// The hourly rows are recomputed from samples_15m over the hours a write touches
// (lib/services/samples/refresh-hourly-rollup.ts), in the writer's transaction, so
// they never drift from the 15-minute rollup. Whatever deletes a well's samples must
// delete its samples_1h rows too (no foreign key, as for samples_15m).
//
// sample_series_versions: per (well, signal), a number that changes (from one
// sequence, so it never repeats) in every transaction that changes the series. The
// same refresh statement sets it. The web app keeps recently drawn chart answers in
// memory keyed on these numbers, so an answer is reused only while no process has
// written to any of its series since (one primary-key read per request).

const BACKFILL = `
INSERT INTO samples_1h (well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tmin, tmax)
SELECT well_id, signal, date_bin('1 hour', bucket, timestamptz '2000-01-01Z'),
       sum(n)::int, min(vmin), max(vmax), sum(vsum),
       (min(array[extract(epoch FROM bucket)::float8, vfirst]))[2],
       (max(array[extract(epoch FROM bucket)::float8, vlast]))[2],
       to_timestamp((min(array[vmin, extract(epoch FROM bucket)::float8]))[2]),
       to_timestamp(-(max(array[vmax, -extract(epoch FROM bucket)::float8]))[2])
FROM samples_15m
GROUP BY 1, 2, 3
ORDER BY 1, 2, 3`;

/** @type {import('sequelize-cli').Migration} */
module.exports = {
  async up(queryInterface) {
    const q = (sql) => queryInterface.sequelize.query(sql);
    await q(`
      CREATE TABLE samples_1h (
        well_id integer NOT NULL,
        signal smallint NOT NULL,
        bucket timestamptz NOT NULL,
        n integer NOT NULL,
        vmin double precision NOT NULL,
        vmax double precision NOT NULL,
        vsum double precision NOT NULL,
        vfirst double precision NOT NULL,
        vlast double precision NOT NULL,
        tmin timestamptz NOT NULL,
        tmax timestamptz NOT NULL,
        PRIMARY KEY (well_id, signal, bucket)
      )`);
    await q(BACKFILL);
    await q(`ANALYZE samples_1h`);
    await q(`CREATE SEQUENCE sample_series_version_seq`);
    await q(`
      CREATE TABLE sample_series_versions (
        well_id integer NOT NULL,
        signal smallint NOT NULL,
        version bigint NOT NULL,
        PRIMARY KEY (well_id, signal)
      )`);
    await q(`
      INSERT INTO sample_series_versions (well_id, signal, version)
      SELECT well_id, signal, nextval('sample_series_version_seq')
      FROM (SELECT DISTINCT well_id, signal FROM samples_1h ORDER BY 1, 2) s`);
  },

  async down(queryInterface) {
    const q = (sql) => queryInterface.sequelize.query(sql);
    await q(`DROP TABLE IF EXISTS sample_series_versions`);
    await q(`DROP SEQUENCE IF EXISTS sample_series_version_seq`);
    await q(`DROP TABLE IF EXISTS samples_1h`);
  },
};
