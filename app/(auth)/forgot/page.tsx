import { ForgotForm } from "./forgot-form";

export const metadata = { title: "Reset password" };

export default function ForgotPage() {
  return (
    <>
      <h1 className="mb-2 text-lg font-semibold">Reset your password</h1>
      <p className="mb-4 text-sm text-ink-soft">We will e-mail you a link that works once, for one hour.</p>
      <ForgotForm />
    </>
  );
}
