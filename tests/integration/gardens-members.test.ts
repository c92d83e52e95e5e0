import "@/tests/support/integration/env";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as member from "@/app/api/gardens/[gardenId]/members/[userId]/route";
import * as members from "@/app/api/gardens/[gardenId]/members/route";
import * as garden from "@/app/api/gardens/[gardenId]/route";
import * as gardens from "@/app/api/gardens/route";
import {
  call,
  closeHarness,
  cookieFor,
  gardenInput,
  makeGardenWithRoles,
  snapshotDb,
  membershipRole,
  type GardenWorld,
} from "@/tests/support/integration/harness";

let world: GardenWorld;
beforeAll(async () => {
  world = await makeGardenWithRoles();
});
afterAll(closeHarness);

const at = (gardenId: string, rest = "") => ({
  url: `/api/gardens/${gardenId}${rest}`,
  params: { gardenId },
});

describe("gardens", () => {
  it("creates a garden and makes its creator the owner", async () => {
    const cookie = await cookieFor(world.helper);
    const res = await call(gardens.POST, {
      url: "/api/gardens",
      cookie,
      body: gardenInput({ name: "Balcony Tubs" }),
    });
    expect(res.status).toBe(201);
    expect(await membershipRole(res.json.garden.id, world.helper.id)).toBe("owner");
    const list = await call(gardens.GET, { url: "/api/gardens", cookie });
    expect(list.json.gardens).toContainEqual({
      id: res.json.garden.id,
      name: "Balcony Tubs",
      role: "owner",
    });
  });

  it("refuses frost dates out of order and an unknown time zone, naming the fields", async () => {
    const cookie = await cookieFor(world.owner);
    const before = await snapshotDb();
    const res = await call(gardens.POST, {
      url: "/api/gardens",
      cookie,
      body: gardenInput({
        lastSpringFrost: "2026-10-20",
        firstFallFrost: "2026-04-15",
        timeZone: "Mars/Olympus_Mons",
      }),
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields.timeZone).toMatch(/time zone/);
    const frost = await call(gardens.POST, {
      url: "/api/gardens",
      cookie,
      body: gardenInput({ lastSpringFrost: "2026-10-20", firstFallFrost: "2026-04-15" }),
    });
    expect(frost.status).toBe(400);
    expect(frost.json.error.fields.firstFallFrost).toMatch(/after the last spring frost/);
    // Days that do not exist (Gregorian calendar: 2026 is not a leap year; April has 30 days)
    // must be a 400 naming the field, not a database error.
    for (const day of ["2026-02-30", "2026-02-29", "2026-04-31"]) {
      const badDay = await call(gardens.POST, {
        url: "/api/gardens",
        cookie,
        body: gardenInput({ lastSpringFrost: day }),
      });
      expect(badDay.status, day).toBe(400);
      expect(badDay.json.error.fields.lastSpringFrost).toMatch(/not a real date/);
    }
    expect(await snapshotDb()).toBe(before);
    // 2028 is a leap year (divisible by 4, not a century), so its 29 February is real.
    const leap = await call(gardens.POST, {
      url: "/api/gardens",
      cookie,
      body: gardenInput({ lastSpringFrost: "2028-02-29", firstFallFrost: "2028-10-20" }),
    });
    expect(leap.status).toBe(201);
  });

  it("lets the owner edit, and checks frost order against the stored dates", async () => {
    const g = await makeGardenWithRoles(world);
    const cookie = await cookieFor(world.owner);
    const ok = await call(garden.PATCH, {
      ...at(g.gardenId),
      method: "PATCH",
      cookie,
      body: { name: "Hollis St. Garden" },
    });
    expect(ok.status).toBe(200);
    expect(ok.json.garden.name).toBe("Hollis St. Garden");
    // Stored spring frost is 04-15: a fall frost in March is out of order even when sent alone.
    const bad = await call(garden.PATCH, {
      ...at(g.gardenId),
      method: "PATCH",
      cookie,
      body: { firstFallFrost: "2026-03-01" },
    });
    expect(bad.status).toBe(400);
    expect(bad.json.error.fields.firstFallFrost).toBeTruthy();
    const read = await call(garden.GET, {
      ...at(g.gardenId),
      cookie: await cookieFor(world.viewer),
    });
    expect(read.json).toMatchObject({
      role: "viewer",
      // Frost days are kept as month and day: the year sent is not stored.
      garden: { name: "Hollis St. Garden", firstFallFrost: "10-20" },
    });
  });

  it("deletes only when the exact name is typed", async () => {
    const g = await makeGardenWithRoles(world, "Allotment 12");
    const cookie = await cookieFor(world.owner);
    for (const confirmName of ["allotment 12", "Allotment", ""]) {
      const res = await call(garden.DELETE, {
        ...at(g.gardenId),
        method: "DELETE",
        cookie,
        body: { confirmName },
      });
      expect(res.status, JSON.stringify(confirmName)).toBe(400);
      expect(res.json.error.fields.confirmName).toBeTruthy();
    }
    expect(await membershipRole(g.gardenId, world.owner.id)).toBe("owner");
    const res = await call(garden.DELETE, {
      ...at(g.gardenId),
      method: "DELETE",
      cookie,
      body: { confirmName: "Allotment 12" },
    });
    expect(res.status).toBe(200);
    // Memberships go with it (ON DELETE CASCADE), and the garden then answers 404.
    expect(await membershipRole(g.gardenId, world.viewer.id)).toBeUndefined();
    expect((await call(garden.GET, { ...at(g.gardenId), cookie })).status).toBe(404);
  });

  it("deletes when a phone typed the name with a curly apostrophe (issue 12 item 7)", async () => {
    const g = await makeGardenWithRoles(world, "Bo's Plot");
    const res = await call(garden.DELETE, {
      ...at(g.gardenId),
      method: "DELETE",
      cookie: await cookieFor(world.owner),
      // U+2019 RIGHT SINGLE QUOTATION MARK, what iOS types for an apostrophe.
      body: { confirmName: "Bo\u2019s Plot" },
    });
    expect(res.status).toBe(200);
    expect(await membershipRole(g.gardenId, world.owner.id)).toBeUndefined();
  });

  it("answers 404 to a non-member asking for another garden's data, as for a garden that does not exist", async () => {
    const cookie = await cookieFor(world.outsider);
    for (const handler of [garden.GET, members.GET]) {
      const theirs = await call(handler, { ...at(world.gardenId, "/members"), cookie });
      const none = await call(handler, {
        ...at("00000000-0000-4000-8000-000000000000", "/members"),
        cookie,
      });
      const junk = await call(handler, { ...at("not-a-uuid", "/members"), cookie });
      expect([theirs.status, none.status, junk.status]).toEqual([404, 404, 404]);
      expect(theirs.json).toEqual(none.json);
    }
    // Their own garden still answers.
    expect((await call(garden.GET, { ...at(world.outsiderGardenId), cookie })).status).toBe(200);
  });
});

describe("members", () => {
  it("the last owner can neither leave nor be demoted (409), and nothing changes", async () => {
    const g = await makeGardenWithRoles(world);
    const cookie = await cookieFor(world.owner);
    const self = {
      url: `/api/gardens/${g.gardenId}/members/${world.owner.id}`,
      params: { gardenId: g.gardenId, userId: world.owner.id },
    };
    const before = await snapshotDb();
    const demote = await call(member.PATCH, {
      ...self,
      method: "PATCH",
      cookie,
      body: { role: "grower" },
    });
    const leave = await call(member.DELETE, { ...self, method: "DELETE", cookie });
    expect([demote.status, leave.status]).toEqual([409, 409]);
    expect(demote.json.error.code).toBe("conflict:last_owner");
    expect(await snapshotDb()).toBe(before);

    // With a second owner, the first may step down.
    const grower = { url: "", params: { gardenId: g.gardenId, userId: world.grower.id } };
    expect(
      (await call(member.PATCH, { ...grower, method: "PATCH", cookie, body: { role: "owner" } }))
        .status,
    ).toBe(200);
    expect(
      (await call(member.PATCH, { ...self, method: "PATCH", cookie, body: { role: "grower" } }))
        .status,
    ).toBe(200);
    expect(await membershipRole(g.gardenId, world.owner.id)).toBe("grower");
  });

  it("a member can leave, and then sees the garden as not found", async () => {
    const g = await makeGardenWithRoles(world);
    const cookie = await cookieFor(world.helper);
    const res = await call(member.DELETE, {
      url: "",
      method: "DELETE",
      params: { gardenId: g.gardenId, userId: world.helper.id },
      cookie,
    });
    expect(res.status).toBe(200);
    expect(await membershipRole(g.gardenId, world.helper.id)).toBeUndefined();
    expect((await call(garden.GET, { ...at(g.gardenId), cookie })).status).toBe(404);
  });

  it("a role is read from the database on every request, not from the session", async () => {
    const g = await makeGardenWithRoles(world);
    const viewer = await cookieFor(world.viewer);
    const patch = () =>
      call(garden.PATCH, {
        ...at(g.gardenId),
        method: "PATCH",
        cookie: viewer,
        body: { location: "Shed" },
      });
    expect((await patch()).status).toBe(403);
    const promote = {
      url: "",
      method: "PATCH",
      params: { gardenId: g.gardenId, userId: world.viewer.id },
    };
    await call(member.PATCH, {
      ...promote,
      cookie: await cookieFor(world.owner),
      body: { role: "owner" },
    });
    // Same cookie as before the promotion.
    expect((await patch()).status).toBe(200);
  });
});
