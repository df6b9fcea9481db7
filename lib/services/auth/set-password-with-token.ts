import bcrypt from "bcryptjs";
import { User, sequelize } from "@/models";
import { AppError } from "@/lib/errors";
import { SetPasswordSchema } from "@/lib/validations/auth";
import { parseOrThrow } from "@/lib/http";
import { writeAudit } from "@/lib/services/audit/write-audit";
import { findLiveToken } from "./tokens";
import { clearSignInFailures } from "./sign-in-limits";

/** Use an invitation or reset link once: set the password, activate the user. */
export async function setPasswordWithToken(input: unknown): Promise<{ email: string }> {
  const data = parseOrThrow(SetPasswordSchema, input);
  return sequelize.transaction(async (transaction) => {
    const row = await findLiveToken(data.token, transaction);
    if (!row) throw new AppError("invalid", "This link has expired or was already used. Ask for a new one.");
    const user = await User.findOne({ where: { id: row.user_id, organization_id: row.organization_id }, transaction });
    if (!user) throw new AppError("invalid", "This link has expired or was already used. Ask for a new one.");
    await user.update({ password_hash: await bcrypt.hash(data.password, 10), active: true }, { transaction });
    await row.update({ used_at: new Date() }, { transaction });
    await writeAudit(
      { userId: user.id, organizationId: user.organization_id, role: user.role },
      { action: row.purpose === "invite" ? "user.accept_invite" : "user.reset_password", entityType: "user", entityId: user.id },
      transaction,
    );
    await clearSignInFailures(user.email);
    return { email: user.email };
  });
}

/** For the link page: is the token still good, and whose is it? */
export async function describeToken(token: string): Promise<{ email: string; purpose: "invite" | "reset" } | null> {
  const row = await findLiveToken(token);
  if (!row) return null;
  const user = await User.findByPk(row.user_id, { attributes: ["email"] });
  return user ? { email: user.email, purpose: row.purpose } : null;
}
