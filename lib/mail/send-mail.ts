// Outgoing e-mail through nodemailer over SMTP. In development and tests the
// SMTP server is the local fake (scripts/mail-sink.ts); in production it is
// whatever SMTP_URL names.
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/lib/env";

const g = globalThis as unknown as { __bellowsMail?: Transporter };

function transport(): Transporter {
  g.__bellowsMail ??= nodemailer.createTransport(env().SMTP_URL);
  return g.__bellowsMail;
}

export interface Mail {
  to: string;
  subject: string;
  text: string;
}

export async function sendMail(mail: Mail): Promise<void> {
  await transport().sendMail({
    from: env().MAIL_FROM,
    to: mail.to,
    subject: mail.subject,
    text: `${mail.text}\n\n--\nBellows gas-lift surveillance. Advisory only: field work follows your company's procedures, local regulations and licensed engineering judgment.\n`,
  });
}

export function appUrl(path: string): string {
  return new URL(path, env().APP_URL).toString();
}
