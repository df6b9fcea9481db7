import type { Transaction } from "sequelize";
import { User } from "@/models";
import { AppError } from "@/lib/errors";

/** An active operator of the organization, or a field error naming the assignee. */
export async function findOrgOperator(organizationId: number, userId: number, transaction?: Transaction): Promise<User> {
  const u = await User.findOne({ where: { id: userId, organization_id: organizationId, role: "operator", active: true }, transaction });
  if (!u) throw new AppError("invalid", "Choose an active field operator of your organization", [{ path: "assigneeId", message: "not an operator here" }]);
  return u;
}
