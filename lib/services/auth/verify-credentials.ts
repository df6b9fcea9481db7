import bcrypt from "bcryptjs";
import { User } from "@/models";
import { AppError } from "@/lib/errors";
import { SignInSchema } from "@/lib/validations/auth";
import { clearSignInFailures, isSignInBlocked, recordSignInFailure } from "./sign-in-limits";
import type { Role } from "@/lib/auth/roles";

export interface SessionUser {
  id: number;
  email: string;
  name: string;
  role: Role;
  organizationId: number;
}

/** Check e-mail and password; count failures; refuse when over the limit. */
export async function verifyCredentials(input: unknown, address: string): Promise<SessionUser> {
  const parsed = SignInSchema.safeParse(input);
  if (!parsed.success) throw new AppError("invalid", "Enter your e-mail and password");
  const email = parsed.data.email.toLowerCase();
  const blocked = await isSignInBlocked(email, address);
  if (blocked) throw new AppError("rate_limited", blocked);

  const user = await User.findOne({ where: { email } });
  const ok = !!user?.password_hash && user.active && (await bcrypt.compare(parsed.data.password, user.password_hash));
  if (!user || !ok) {
    await recordSignInFailure(email, address);
    throw new AppError("unauthenticated", "E-mail or password is not right, or the account is not active");
  }
  await clearSignInFailures(email);
  return { id: user.id, email: user.email, name: user.name, role: user.role, organizationId: user.organization_id };
}
