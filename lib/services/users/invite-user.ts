import { UniqueConstraintError } from "sequelize";
import { Organization, User, sequelize } from "@/models";
import { requireCapability, type Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/errors";
import { InviteSchema } from "@/lib/validations/auth";
import { parseOrThrow } from "@/lib/http";
import { appUrl, sendMail } from "@/lib/mail/send-mail";
import { writeAudit } from "@/lib/services/audit/write-audit";
import { ROLE_LABEL } from "@/lib/auth/roles";
import { issueToken, TOKEN_HOURS } from "@/lib/services/auth/tokens";

/** Admin invites a person into their organization; the e-mail carries a one-time link. */
export async function inviteUser(actor: Actor, input: unknown): Promise<{ id: number }> {
  requireCapability(actor, "users.manage");
  const data = parseOrThrow(InviteSchema, input);
  const email = data.email.toLowerCase();
  try {
    const { user, token } = await sequelize.transaction(async (transaction) => {
      const user = await User.create(
        { organization_id: actor.organizationId, email, name: data.name, role: data.role, password_hash: null, active: false },
        { transaction },
      );
      const token = await issueToken(user, "invite", transaction);
      await writeAudit(actor, { action: "user.invite", entityType: "user", entityId: user.id, after: { email, name: data.name, role: data.role } }, transaction);
      return { user, token };
    });
    const org = await Organization.findByPk(actor.organizationId, { attributes: ["name"] });
    await sendMail({
      to: email,
      subject: `You are invited to Bellows (${org?.name ?? "your organization"})`,
      text: `Hello ${data.name},\n\nYou have been invited to Bellows as ${ROLE_LABEL[data.role]} for ${org?.name}.\n\nChoose your password here within ${TOKEN_HOURS.invite} hours:\n${appUrl(`/invite/${token}`)}\n`,
    });
    return { id: user.id };
  } catch (e) {
    if (e instanceof UniqueConstraintError) {
      throw new AppError("conflict", "This e-mail already has an account", [{ path: "email", message: "Already in use" }]);
    }
    throw e;
  }
}
