import { z } from "zod";
import { roles } from "@/lib/auth/roles";
import { listedTimeZone } from "@/lib/time-zones";
import { plainText } from "./text";

// Frost dates are the usual days, month and day with no year ("04-15"): the plan
// applies them to every year it covers. A full date ("2026-04-15", as older
// clients and scenario files send) is checked as a date and keeps its month and day.
export const FIRST_YEAR = 1900;
export const LAST_YEAR = 2200;

const MONTH_DAY = /^(\d{2})-(\d{2})$/;
const FULL_DATE = /^(\d{4})-(\d{2}-\d{2})$/;

/** True for a month and day that some year has (29 February included: leap years). */
function isMonthDay(md: string): boolean {
  const m = MONTH_DAY.exec(md);
  if (!m) return false;
  const [month, day] = [Number(m[1]), Number(m[2])];
  const date = new Date(Date.UTC(2024, month - 1, day)); // 2024 is a leap year
  return month >= 1 && month <= 12 && date.getUTCMonth() === month - 1 && date.getUTCDate() === day;
}

const frostDay = (label: string) =>
  z.string({ error: `Enter the ${label}.` }).transform((value, ctx) => {
    const full = FULL_DATE.exec(value);
    if (full) {
      const year = Number(full[1]);
      // Round-trip, not just Date.parse: V8 rolls "2026-02-30" over to 2 March.
      const parsed = new Date(`${value}T00:00:00Z`);
      if (Number.isNaN(parsed.getTime()) || parsed.toISOString().slice(0, 10) !== value) {
        ctx.addIssue({ code: "custom", message: `The ${label} is not a real date.` });
        return z.NEVER;
      }
      if (year < FIRST_YEAR || year > LAST_YEAR) {
        ctx.addIssue({
          code: "custom",
          message: `The ${label} must be between ${FIRST_YEAR} and ${LAST_YEAR}.`,
        });
        return z.NEVER;
      }
      return full[2]!;
    }
    if (!MONTH_DAY.test(value)) {
      ctx.addIssue({ code: "custom", message: `Choose the month and day of the ${label}.` });
      return z.NEVER;
    }
    if (!isMonthDay(value)) {
      ctx.addIssue({ code: "custom", message: `The ${label} is not a real day.` });
      return z.NEVER;
    }
    return value;
  });

const gardenFields = z.object({
  name: plainText().min(1, "Give the garden a name.").max(80, "Use at most 80 characters."),
  timeZone: plainText()
    .min(1, "Choose a time zone.")
    .transform((name, ctx) => {
      const listed = listedTimeZone(name);
      if (listed) return listed;
      ctx.addIssue({
        code: "custom",
        message: "Choose a time zone from the list, e.g. America/Chicago.",
      });
      return z.NEVER;
    }),
  unitSystem: z.enum(["us", "metric"], { error: "Choose US customary or metric." }),
  lastSpringFrost: frostDay("last spring frost"),
  firstFallFrost: frostDay("first fall frost"),
  location: plainText().max(200, "Use at most 200 characters.").optional().nullable(),
});

const frostOrder = (v: { lastSpringFrost?: string; firstFallFrost?: string }) =>
  !v.lastSpringFrost || !v.firstFallFrost || v.lastSpringFrost < v.firstFallFrost;
const frostOrderIssue = {
  message: "The first fall frost must come after the last spring frost.",
  path: ["firstFallFrost"],
};

export const createGardenSchema = gardenFields.refine(frostOrder, frostOrderIssue);
export type CreateGardenInput = z.infer<typeof createGardenSchema>;

export const updateGardenSchema = gardenFields.partial().refine(frostOrder, frostOrderIssue);
export type UpdateGardenInput = z.infer<typeof updateGardenSchema>;

export const deleteGardenSchema = z.object({
  confirmName: plainText("Type the garden's name to confirm.").min(
    1,
    "Type the garden's name to confirm.",
  ),
});

export const roleSchema = z.enum(roles, {
  error: "Choose a role: owner, grower, helper or viewer.",
});

export const inviteSchema = z.object({
  email: z.string().trim().max(254).pipe(z.email("Enter a valid e-mail address.")),
  role: roleSchema,
});
export type InviteInput = z.infer<typeof inviteSchema>;

export const changeRoleSchema = z.object({ role: roleSchema });

export const acceptInvitationSchema = z.object({
  token: z
    .string()
    .min(20, "This invitation link is not valid.")
    .max(200, "This invitation link is not valid."),
});
