// Failed sign-ins are limited per account and per network address in a fixed
// window, so guessing one password or spraying many accounts both stop early.
import { sequelize } from "@/models";

export const SIGN_IN_LIMITS = {
  windowMinutes: 15,
  perAccount: 5,
  perAddress: 20,
};

type Key = string;

async function countFor(key: Key): Promise<number> {
  const [rows] = await sequelize.query(
    `SELECT count FROM sign_in_failures WHERE key = $1 AND window_start > now() - ($2 || ' minutes')::interval`,
    { bind: [key, String(SIGN_IN_LIMITS.windowMinutes)] },
  );
  return (rows as { count: number }[])[0]?.count ?? 0;
}

export async function isSignInBlocked(email: string, address: string): Promise<string | null> {
  const [acct, addr] = await Promise.all([countFor(`account:${email}`), countFor(`address:${address}`)]);
  if (acct >= SIGN_IN_LIMITS.perAccount) {
    return `Too many failed sign-ins for this account. Try again in ${SIGN_IN_LIMITS.windowMinutes} minutes or reset your password.`;
  }
  if (addr >= SIGN_IN_LIMITS.perAddress) {
    return `Too many failed sign-ins from this network address. Try again in ${SIGN_IN_LIMITS.windowMinutes} minutes.`;
  }
  return null;
}

export async function recordSignInFailure(email: string, address: string): Promise<void> {
  for (const key of [`account:${email}`, `address:${address}`]) {
    await sequelize.query(
      `INSERT INTO sign_in_failures (key, count, window_start) VALUES ($1, 1, now())
       ON CONFLICT (key) DO UPDATE SET
         count = CASE WHEN sign_in_failures.window_start > now() - ($2 || ' minutes')::interval THEN sign_in_failures.count + 1 ELSE 1 END,
         window_start = CASE WHEN sign_in_failures.window_start > now() - ($2 || ' minutes')::interval THEN sign_in_failures.window_start ELSE now() END`,
      { bind: [key, String(SIGN_IN_LIMITS.windowMinutes)] },
    );
  }
}

export async function clearSignInFailures(email: string): Promise<void> {
  await sequelize.query(`DELETE FROM sign_in_failures WHERE key = $1`, { bind: [`account:${email}`] });
}
