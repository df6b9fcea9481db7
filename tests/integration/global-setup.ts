// Integration tests run against the real test-profile PostgreSQL and Redis
// (scripts/test.sh starts them). This brings the schema up to date once.
import { execFileSync } from "node:child_process";

export default function setup() {
  if (!process.env.DATABASE_URL?.includes("_test")) {
    throw new Error("Integration tests need the test profile: run them through `npm test`, or `PROFILE=test` with scripts/env.sh sourced");
  }
  execFileSync("npx", ["sequelize-cli", "db:migrate"], { stdio: "pipe", env: process.env });
}
