"use strict";
// samples_3h: a 3-hour rollup of samples_1h, for the longest chart ranges.
//
// Why: a 90-day chart at the default width draws 3-hour min/max buckets
// (lib/trends/bucket-plan.ts). Grouping them per request from samples_1h reads 3
// hourly rows per bucket and cost ~7 ms of database CPU per request (measured), which
// kept the chart above its speed target; from a stored 3-hour table each bucket is one
// row, read as it is.
//
// Same columns as samples_1h. Per (well, signal, 3-hour bucket), over its hourly rows:
// count and sum add, least minimum, greatest maximum, first value of the earliest
// hour, last value of the latest hour, and tmin (tmax) is the tmin (tmax) of the hour
// holding the least minimum (greatest maximum), the earliest on a tie: the start of
// the earliest 15-minute bucket holding the extreme, as in samples_1h. Buckets bin
// from 2000-01-01 UTC, a whole number of 3 hours from the Unix epoch too (10,957 days).
//
// Two more columns than samples_1h: hfirst and hlast, the start of the earliest and
// the latest hour the row holds. A write of new hours (the usual case) adds its own
// 3-hour partial rows to the stored ones (counts and sums add, extremes combine, and
// first/last go to whichever side's hour is earlier/later), so such a batch reads
// nothing back (recomputing its buckets from samples_1h cost ~15 ms per 50,000-value
// batch, measured); a write into stored hours recomputes them from samples_1h
// (lib/services/samples/refresh-three-hour-rollup.ts). Both run in the writer's
// transaction, so the rows never drift from the hourly rollup. Whatever deletes a well's samples must
// delete its samples_3h rows too (no foreign key, as for samples_15m and samples_1h).

// First/last and arg-min/arg-max by min/max of two-element arrays (compared element
// by element), not a sort per group; the negated time in max() picks the earliest
// time of the maximum on a tie.
const BACKFILL = `
INSERT INTO samples_3h (well_id, signal, bucket, n, vmin, vmax, vsum, vfirst, vlast, tmin, tmax, hfirst, hlast)
SELECT well_id, signal, date_bin('3 hours', bucket, timestamptz '2000-01-01Z'),
       sum(n)::int, min(vmin), max(vmax), sum(vsum),
       (min(array[extract(epoch FROM bucket)::float8, vfirst]))[2],
       (max(array[extract(epoch FROM bucket)::float8, vlast]))[2],
       to_timestamp((min(array[vmin, extract(epoch FROM tmin)::float8]))[2]),
       to_timestamp(-(max(array[vmax, -extract(epoch FROM tmax)::float8]))[2]),
       min(bucket), max(bucket)
FROM samples_1h
GROUP BY 1, 2, 3
ORDER BY 1, 2, 3`;

/** @type {import('sequelize-cli').Migration} */
module.exports = {
  async up(queryInterface) {
    const q = (sql) => queryInterface.sequelize.query(sql);
    await q(`
      CREATE TABLE samples_3h (
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
        hfirst timestamptz NOT NULL,
        hlast timestamptz NOT NULL,
        PRIMARY KEY (well_id, signal, bucket)
      )`);
    await q(BACKFILL);
    await q(`ANALYZE samples_3h`);
  },

  async down(queryInterface) {
    await queryInterface.sequelize.query(`DROP TABLE IF EXISTS samples_3h`);
  },
};
