import "@/tests/support/integration/env";
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import * as accountRoute from "@/app/api/account/route";
import * as gardenRoute from "@/app/api/gardens/[gardenId]/route";
import * as gardensRoute from "@/app/api/gardens/route";
import { createUser } from "@/db/queries/users";
import { hashPassword } from "@/lib/auth/password";
import { toResponse } from "@/lib/errors";
import {
  call,
  closeHarness,
  countRows,
  createGardenAs,
  errorCode,
  gardenInput,
  signUpUser,
  uniqueEmail,
  type Handler,
  type TestUser,
} from "@/tests/support/integration/harness";

// The probe's inputs: a NUL in a name or location and the date 0000-01-01 each
// gave a 500, and the failing query was logged with its parameters (e-mail and
// argon2 hash). PostgreSQL text cannot store U+0000 (its docs, "Character Types").

let ann: TestUser;
beforeAll(async () => {
  ann = await signUpUser("hardening");
});
afterEach(() => vi.restoreAllMocks());
afterAll(closeHarness);

describe("control characters", () => {
  it("sign-up with a NUL in the name is a 400 naming the field", async () => {
    const res = await call(accountRoute.POST, {
      url: "/api/account",
      body: { name: "Ann\u0000", email: uniqueEmail("nul"), password: "tidy-worm-castings-2031" },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields).toHaveProperty("name");
  });

  it.each(["name", "location"])(
    "a new garden with a NUL in %s is a 400 naming it",
    async (field) => {
      const before = await countRows("gardens");
      const res = await call(gardensRoute.POST, {
        url: "/api/gardens",
        cookie: ann.cookie,
        body: gardenInput({ [field]: "Plot\u0000 3" }),
      });
      expect(res.status).toBe(400);
      expect(res.json.error.fields).toHaveProperty(field);
      expect(await countRows("gardens")).toBe(before);
    },
  );

  it("renaming a garden with an escape character is a 400", async () => {
    const garden = await createGardenAs(ann.cookie);
    const res = await call(gardenRoute.PATCH as Handler, {
      method: "PATCH",
      url: `/api/gardens/${garden.id}`,
      params: { gardenId: garden.id },
      cookie: ann.cookie,
      body: { name: "Plot \u001b[2J" },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields).toHaveProperty("name");
  });
});

describe("dates", () => {
  it("0000-01-01 is a 400 naming the field and the allowed years", async () => {
    const res = await call(gardensRoute.POST, {
      url: "/api/gardens",
      cookie: ann.cookie,
      body: gardenInput({ lastSpringFrost: "0000-01-01" }),
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.lastSpringFrost).toMatch(/1900.*2200/);
  });
});

describe("what a database error writes to the log", () => {
  it("has the error but neither the e-mail nor the argon2 hash", async () => {
    const email = uniqueEmail("logged");
    const passwordHash = await hashPassword("tidy-worm-castings-2031");
    // Straight to the query, past validation: PostgreSQL itself refuses the NUL.
    const failure = await createUser({ email, name: "Nul\u0000", passwordHash }).then(
      () => null,
      (error: unknown) => error,
    );
    expect(failure).not.toBeNull();
    const lines: string[] = [];
    const capture = (...args: unknown[]) => {
      lines.push(
        args
          .map((a) =>
            typeof a === "string" ? a : String(a instanceof Error ? a.stack : JSON.stringify(a)),
          )
          .join(" "),
      );
    };
    vi.spyOn(console, "error").mockImplementation(capture);
    vi.spyOn(console, "warn").mockImplementation(capture);
    vi.spyOn(console, "log").mockImplementation(capture);
    const response = toResponse(failure);
    expect(response.status).toBe(500);
    const written = lines.join("\n");
    expect(written).toMatch(/22021|invalid byte sequence/);
    expect(written).not.toContain(email);
    expect(written).not.toContain(passwordHash);
    expect(written).not.toContain("$argon2id$");
    expect(
      errorCode({
        status: 500,
        json: await response.json(),
        text: "",
        headers: new Headers(),
        setCookie: null,
        cookie: null,
      }),
    ).toBe("internal");
  });
});
