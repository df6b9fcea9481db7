"use strict";
// samples_3h.extremes: each 3-hour bucket's minimum and maximum as the chart draws
// them, the earlier first, written as float4 text ("1008.0318,1091.4823").
//
// Why: a 90-day chart reads 720 of these buckets per signal, and turning 7,200
// doubles into text on every request was most of that read's database CPU (~3.0
// against ~1.6 ms for 90 days × 5 signals, measured here). A generated column is
// written by PostgreSQL itself whenever the row is inserted or updated, by any
// writer, so it can never disagree with vmin, vmax and their times.
//
// Which came first: by tmin and tmax; on a tie (both in the same 15-minute bucket),
// the first value's side (nearer its minimum → minimum first), as isMinFirst in
// lib/trends/minmax-points.ts and the minFirst SQL in
// lib/services/trends/query-trend-series.ts. float4 text is the shortest text that
// reads back to the same float4, about 7 significant digits; both casts are
// immutable, as a generated column requires.
const EXTREMES = `
CASE WHEN CASE WHEN tmin <> tmax THEN tmin < tmax ELSE vfirst - vmin <= vmax - vfirst END
     THEN vmin::float4::text || ',' || vmax::float4::text
     ELSE vmax::float4::text || ',' || vmin::float4::text END`;

/** @type {import('sequelize-cli').Migration} */
module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.query(`ALTER TABLE samples_3h ADD COLUMN extremes text GENERATED ALWAYS AS (${EXTREMES}) STORED`);
  },

  async down(queryInterface) {
    await queryInterface.sequelize.query(`ALTER TABLE samples_3h DROP COLUMN IF EXISTS extremes`);
  },
};
