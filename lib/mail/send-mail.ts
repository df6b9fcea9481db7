// Outgoing e-mail through nodemailer over SMTP. In development and tests the
// SMTP server is the local fake (scripts/mail-sink.ts); in production it is
// whatever SMTP_URL names.
import nodemailer, { type Transporter } from "nodemailer";

const g = globalThis as unknown as { __bellowsMail?: Transporter };

function transport(): Transporter {
  g.__bellowsMail ??= nodemailer.createTransport(process.env.SMTP_URL ?? "smtp://127.0.0.1:2525");
  return g.__bellowsMail;
}

export interface Mail {
  to: string;
  subject: string;
  text: string;
}

export async function sendMail(mail: Mail): Promise<void> {
  await transport().sendMail({
    from: process.env.MAIL_FROM ?? "Bellows <no-reply@bellows.test>",
    to: mail.to,
    subject: mail.subject,
    text: `${mail.text}\n\n--\nBellows gas-lift surveillance. Advisory only: field work follows your company's procedures, local regulations and licensed engineering judgment.\n`,
  });
}

export function appUrl(path: string): string {
  return new URL(path, process.env.APP_URL ?? process.env.NEXTAUTH_URL ?? "http://localhost:3000").toString();
}
