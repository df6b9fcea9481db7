// Sign-in checks, limits and one-time links against the real database.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import bcrypt from "bcryptjs";
import { User } from "@/models";
import { makeOrg, closeDb, type TestOrg } from "../helpers";
import { verifyCredentials } from "@/lib/services/auth/verify-credentials";
import { SIGN_IN_LIMITS } from "@/lib/services/auth/sign-in-limits";
import { issueToken } from "@/lib/services/auth/tokens";
import { setPasswordWithToken } from "@/lib/services/auth/set-password-with-token";

let t: TestOrg;
let email: string;

beforeAll(async () => {
  t = await makeOrg("signin");
  const u = await User.findByPk(t.actors.engineer.userId!);
  email = u!.email;
  await u!.update({ password_hash: await bcrypt.hash("right-password", 4) });
});
afterAll(closeDb);

describe("verifyCredentials", () => {
  it("accepts the right password and carries role and organization", async () => {
    const s = await verifyCredentials({ email, password: "right-password" }, "10.0.0.1");
    expect(s).toMatchObject({ role: "engineer", organizationId: t.organizationId });
  });

  it("locks the account after repeated failures, with a clear message", async () => {
    for (let i = 0; i < SIGN_IN_LIMITS.perAccount; i++) {
      await expect(verifyCredentials({ email, password: "wrong" }, `10.0.1.${i}`)).rejects.toMatchObject({ code: "unauthenticated" });
    }
    await expect(verifyCredentials({ email, password: "right-password" }, "10.0.2.1")).rejects.toMatchObject({
      code: "rate_limited",
      message: expect.stringMatching(/Too many failed sign-ins for this account/),
    });
  });

  it("limits one address spraying many accounts", async () => {
    for (let i = 0; i < SIGN_IN_LIMITS.perAddress; i++) {
      await verifyCredentials({ email: `nobody${i}@test.invalid`, password: "x" }, "10.9.9.9").catch(() => undefined);
    }
    await expect(verifyCredentials({ email: "someone@test.invalid", password: "x" }, "10.9.9.9")).rejects.toMatchObject({
      code: "rate_limited",
      message: expect.stringMatching(/network address/),
    });
  });
});

describe("one-time links", () => {
  it("set a password once, then refuse the same link", async () => {
    const user = (await User.findByPk(t.actors.operator.userId!))!;
    const token = await issueToken(user, "invite");
    await setPasswordWithToken({ token, password: "a-new-password!", confirm: "a-new-password!" });
    const again = setPasswordWithToken({ token, password: "another-password", confirm: "another-password" });
    await expect(again).rejects.toMatchObject({ code: "invalid" });
    const s = await verifyCredentials({ email: user.email, password: "a-new-password!" }, "10.0.3.1");
    expect(s.id).toBe(user.id);
  });
});
