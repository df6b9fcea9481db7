"use strict";
// samples_15m keeps the times of each bucket's first and last value, so a batch of
// new values can be folded into an existing bucket (count, min, max, sum, and the
// first/last value by time) without reading the bucket's samples back.
// The ingest fast path does that (lib/services/samples/write-sample-batch.ts);
// a batch that replaces stored values still recomputes its buckets from samples.

/** @type {import('sequelize-cli').Migration} */
module.exports = {
  async up(queryInterface) {
    const q = (sql) => queryInterface.sequelize.query(sql);
    await q(`ALTER TABLE samples_15m ADD COLUMN tfirst timestamptz, ADD COLUMN tlast timestamptz`);
    // Existing buckets: their first and last sample times (buckets bin from 2000-01-01 UTC).
    await q(`
      UPDATE samples_15m r SET tfirst = x.tfirst, tlast = x.tlast
      FROM (
        SELECT well_id, signal, date_bin('15 minutes', t, timestamptz '2000-01-01Z') AS bucket, min(t) AS tfirst, max(t) AS tlast
        FROM samples GROUP BY 1, 2, 3
      ) x
      WHERE r.well_id = x.well_id AND r.signal = x.signal AND r.bucket = x.bucket`);
    // A bucket with no samples left (should not exist) gets its own start: harmless bounds.
    await q(`UPDATE samples_15m SET tfirst = bucket, tlast = bucket WHERE tfirst IS NULL`);
    await q(`ALTER TABLE samples_15m ALTER COLUMN tfirst SET NOT NULL, ALTER COLUMN tlast SET NOT NULL`);
  },

  async down(queryInterface) {
    await queryInterface.sequelize.query(`ALTER TABLE samples_15m DROP COLUMN tfirst, DROP COLUMN tlast`);
  },
};
