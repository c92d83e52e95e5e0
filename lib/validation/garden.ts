import { z } from "zod";
import { roles } from "@/lib/auth/roles";
import { listedTimeZone } from "@/lib/time-zones";
import { plainText } from "./text";

// Frost dates a garden could have: far enough back for old records, not the
// 0000-01-01 or 9999-12-31 a mistyped field produces.
export const FIRST_YEAR = 1900;
export const LAST_YEAR = 2200;

const isoDay = (label: string) =>
  z
    .string({ error: `Enter the ${label}.` })
    .regex(/^\d{4}-\d{2}-\d{2}$/, `Enter the ${label} as a date.`)
    // Round-trip, not just Date.parse: V8 rolls "2026-02-30" over to 2 March instead of
    // refusing it, and PostgreSQL then rejects the insert with a 500.
    .refine((d) => {
      const parsed = new Date(`${d}T00:00:00Z`);
      return !Number.isNaN(parsed.getTime()) && parsed.toISOString().slice(0, 10) === d;
    }, `The ${label} is not a real date.`)
    .refine((d) => {
      const year = Number(d.slice(0, 4));
      return year >= FIRST_YEAR && year <= LAST_YEAR;
    }, `The ${label} must be between ${FIRST_YEAR} and ${LAST_YEAR}.`);

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
  lastSpringFrost: isoDay("last spring frost date"),
  firstFallFrost: isoDay("first fall frost date"),
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
