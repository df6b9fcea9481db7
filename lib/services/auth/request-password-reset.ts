import { User } from "@/models";
import { RequestResetSchema } from "@/lib/validations/auth";
import { parseOrThrow } from "@/lib/http";
import { appUrl, sendMail } from "@/lib/mail/send-mail";
import { issueToken, TOKEN_HOURS } from "./tokens";

/**
 * Send a reset link if the address belongs to an active user. The answer is
 * the same either way so the form does not reveal who has an account.
 */
export async function requestPasswordReset(input: unknown): Promise<void> {
  const { email } = parseOrThrow(RequestResetSchema, input);
  const user = await User.findOne({ where: { email: email.toLowerCase(), active: true } });
  if (!user) return;
  const token = await issueToken(user, "reset");
  await sendMail({
    to: user.email,
    subject: "Reset your Bellows password",
    text: `Someone (we hope you) asked to reset the Bellows password for ${user.email}.\n\nSet a new password here within ${TOKEN_HOURS.reset} hour:\n${appUrl(`/reset/${token}`)}\n\nIf it was not you, ignore this message; your password stays as it is.`,
  });
}
