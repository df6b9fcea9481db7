import { z } from "zod";

export const SignInSchema = z.object({
  email: z.string().trim().email("Enter a valid e-mail address"),
  password: z.string().min(1, "Enter your password"),
});

export const PASSWORD_RULE = z
  .string()
  .min(10, "Use at least 10 characters")
  .max(200, "Use at most 200 characters");

export const SetPasswordSchema = z
  .object({
    token: z.string().min(20),
    password: PASSWORD_RULE,
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ" });

export const RequestResetSchema = z.object({ email: z.string().trim().email("Enter a valid e-mail address") });

export const InviteSchema = z.object({
  email: z.string().trim().email("Enter a valid e-mail address"),
  name: z.string().trim().min(1, "Enter a name").max(120),
  role: z.enum(["admin", "analyst", "engineer", "operator"]),
});
