import "@/tests/support/integration/env";
import { afterAll, describe, expect, it } from "vitest";
import * as accountPassword from "@/app/api/account/password/route";
import * as account from "@/app/api/account/route";
import { call, closeHarness, signUpUser, uniqueEmail } from "@/tests/support/integration/harness";

// Issue 7 item 10 / OWASP ASVS 5.0 §6.2: refuse passwords that are trivially guessed —
// one repeated character, whitespace only, the account's own e-mail or name, and common
// or breached passwords (the zxcvbn-ts "passwords-common" list).

afterAll(closeHarness);

const signUpWith = (body: Record<string, string>) =>
  call(account.POST, { url: "/api/account", body });

describe("password policy", () => {
  it("refuses one repeated character and whitespace only", async () => {
    for (const password of ["aaaaaaaa", "        ", "zzzzzzzzzzzzzzzz", "\t\t\t\t\t\t\t\t"]) {
      const res = await signUpWith({ name: "Rowan", email: uniqueEmail("weak"), password });
      expect(res.status, JSON.stringify(password)).toBe(400);
      expect(res.json.error.fields.password).toBeTruthy();
    }
  });

  it("refuses the account's own e-mail address or name as its password", async () => {
    const email = uniqueEmail("ownmail");
    const own = await signUpWith({ name: "Rowan Applewood", email, password: email });
    expect(own.status).toBe(400);
    expect(own.json.error.fields.password).toBeTruthy();
    const ownUpper = await signUpWith({ name: "Rowan", email, password: email.toUpperCase() });
    expect(ownUpper.status).toBe(400);
    const local = email.split("@")[0]!;
    expect((await signUpWith({ name: "Rowan", email, password: local })).status).toBe(400);
    const named = await signUpWith({
      name: "Rowan Applewood",
      email: uniqueEmail("ownname"),
      password: "Rowan Applewood",
    });
    expect(named.status).toBe(400);
    expect(named.json.error.fields.password).toBeTruthy();
  });

  it("refuses common passwords, and the own e-mail when changing the password", async () => {
    // "password1" and "iloveyou" head most leaked-password lists (zxcvbn-ts passwords-common).
    for (const password of ["password1", "iloveyou", "12345678"]) {
      expect((await signUpWith({ name: "Rowan", email: uniqueEmail("c"), password })).status).toBe(
        400,
      );
    }
    const user = await signUpUser("changer");
    const res = await call(accountPassword.POST, {
      url: "/api/account/password",
      cookie: user.cookie,
      body: { currentPassword: user.password, newPassword: user.email },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.newPassword).toBeTruthy();
  });
});
