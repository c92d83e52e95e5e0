import { describe, expect, it } from "vitest";
import { signUpSchema } from "@/lib/validation/auth";
import {
  createGardenSchema,
  deleteGardenSchema,
  updateGardenSchema,
} from "@/lib/validation/garden";

// Control characters are Unicode general category Cc (U+0000–U+001F, U+007F–U+009F);
// PostgreSQL text cannot hold U+0000 at all (its docs, "Character Types"), which is
// what turned a NUL in a name into a 500.

const garden = {
  name: "Hollis Street Garden",
  timeZone: "America/Chicago",
  unitSystem: "us",
  lastSpringFrost: "2026-04-15",
  firstFallFrost: "2026-10-20",
  location: "Hollis Street, plot 3",
};

function fieldsOf(result: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }) {
  return result.success ? [] : result.error!.issues.map((i) => i.path.join("."));
}

describe("text fields refuse control characters", () => {
  it.each(["\u0000", "\u0007", "\u001b[31m", "\u007f", "\u0085", "line\nbreak", "tab\there"])(
    "garden name and location with %j",
    (bad) => {
      expect(fieldsOf(createGardenSchema.safeParse({ ...garden, name: `Plot ${bad}` }))).toEqual([
        "name",
      ]);
      expect(fieldsOf(updateGardenSchema.safeParse({ location: `Row ${bad} 3` }))).toEqual([
        "location",
      ]);
      expect(fieldsOf(deleteGardenSchema.safeParse({ confirmName: `x${bad}` }))).toEqual([
        "confirmName",
      ]);
      expect(
        fieldsOf(
          signUpSchema.safeParse({
            name: `Ann${bad}`,
            email: "ann@example.com",
            password: "tidy-worm-castings-2031",
          }),
        ),
      ).toEqual(["name"]);
    },
  );

  it("keeps letters from every script, emoji and ordinary punctuation", () => {
    for (const name of ["Jardín de Añil", "Огород №3", "菜园", "Plot 🌱 & Co.", "O'Hara — east"]) {
      expect(createGardenSchema.safeParse({ ...garden, name }).success, name).toBe(true);
    }
  });
});

describe("dates are bounded to sensible years", () => {
  it.each(["0000-01-01", "0001-04-15", "1899-12-31", "2201-01-01", "9999-12-31"])(
    "refuses %s with a message naming the range",
    (day) => {
      const result = createGardenSchema.safeParse({
        ...garden,
        lastSpringFrost: day,
        firstFallFrost: "2026-10-20",
      });
      expect(fieldsOf(result)).toContain("lastSpringFrost");
      expect(JSON.stringify(result.error?.issues)).toMatch(/1900.*2200/);
    },
  );

  it("accepts the bounds themselves", () => {
    expect(
      createGardenSchema.safeParse({
        ...garden,
        lastSpringFrost: "1900-01-01",
        firstFallFrost: "2200-12-31",
      }).success,
    ).toBe(true);
  });
});

// Found by the write-route fuzz: a location of nothing but U+FEFF was trimmed to ""
// (String.prototype.trim strips it, ECMA-262 WhiteSpace) and saved as "no location".
describe("text fields refuse invisible formatting characters", () => {
  it.each(["\ufeff".repeat(300), "a\u202egnp.exe", "x\u2066y"])("location %j", (bad) => {
    expect(fieldsOf(updateGardenSchema.safeParse({ location: bad }))).toEqual(["location"]);
  });

  it("keeps zero-width joiners, which emoji and scripts need", () => {
    expect(fieldsOf(updateGardenSchema.safeParse({ location: "Plot 👩\u200d🌾" }))).toEqual([]);
  });
});
