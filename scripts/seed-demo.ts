// npm run db:seed — the demo field (idempotent). Called by npm start and npm test.
import { seedDemo } from "@/lib/services/demo/seed-demo";
import { sequelize } from "@/models";

const t0 = Date.now();
seedDemo()
  .then(async (r) => {
    const wells = r.fields.reduce((n, f) => n + f.wellIds.size, 0);
    console.log(`[bellows] demo field ready: ${r.fields.length} fields, ${wells} wells (${((Date.now() - t0) / 1000).toFixed(1)} s)`);
    await sequelize.close();
  })
  .catch(async (e) => {
    console.error("[bellows] seeding failed:", e);
    await sequelize.close();
    process.exit(1);
  });
