import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { verifyCredentials } from "@/lib/services/auth/verify-credentials";
import { isAppError } from "@/lib/errors";
import type { Role } from "./roles";
import { env } from "@/lib/env";

function clientAddress(headers: Record<string, unknown> | undefined): string {
  const fwd = headers?.["x-forwarded-for"];
  const first = typeof fwd === "string" ? fwd.split(",")[0]?.trim() : undefined;
  const real = headers?.["x-real-ip"];
  return first || (typeof real === "string" ? real : "") || "local";
}

export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: 12 * 3600 },
  pages: { signIn: "/login" },
  secret: env().NEXTAUTH_SECRET,
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials, req) {
        try {
          const u = await verifyCredentials(credentials, clientAddress(req?.headers as Record<string, unknown>));
          return { id: String(u.id), email: u.email, name: u.name, role: u.role, organizationId: u.organizationId };
        } catch (e) {
          // next-auth passes a thrown message back to signIn() as `error`.
          throw new Error(isAppError(e) ? e.message : "Sign-in failed; try again");
        }
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        const u = user as unknown as { id: string; role: Role; organizationId: number };
        token.uid = Number(u.id);
        token.role = u.role;
        token.organizationId = u.organizationId;
      }
      return token;
    },
    async session({ session, token }) {
      session.user = {
        ...session.user,
        id: token.uid as number,
        role: token.role as Role,
        organizationId: token.organizationId as number,
      };
      return session;
    },
  },
};
