// One-time links (invitation, password reset): a random token goes in the
// e-mail, only its SHA-256 is stored, and it works once before it expires.
import crypto from "node:crypto";
import { Op, type Transaction } from "sequelize";
import { AuthToken } from "@/models";

export const TOKEN_HOURS = { invite: 72, reset: 1 } as const;

export const hashToken = (token: string) => crypto.createHash("sha256").update(token).digest("hex");

export async function issueToken(
  user: { id: number; organization_id: number },
  purpose: "invite" | "reset",
  transaction?: Transaction,
): Promise<string> {
  const token = crypto.randomBytes(32).toString("base64url");
  await AuthToken.create(
    {
      organization_id: user.organization_id,
      user_id: user.id,
      purpose,
      token_hash: hashToken(token),
      expires_at: new Date(Date.now() + TOKEN_HOURS[purpose] * 3600_000),
      used_at: null,
    },
    { transaction },
  );
  return token;
}

/** A usable token row, or null when unknown, used or expired. */
export async function findLiveToken(token: string, transaction?: Transaction): Promise<AuthToken | null> {
  return AuthToken.findOne({
    where: { token_hash: hashToken(token), used_at: null, expires_at: { [Op.gt]: new Date() } },
    transaction,
    lock: transaction ? true : undefined,
  });
}
