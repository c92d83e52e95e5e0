import { z } from "zod";
import { GEOMETRY_LIMITS } from "@/lib/engine";
import { isBoundedRule } from "@/lib/engine";
import {
  feederClassSchema,
  gardenSeasonSchema,
  isoDateSchema,
  nominalBoardSchema,
  unitSystemSchema,
} from "@/lib/validation/engine-inputs";
import { quantitySchema, ratioSchema } from "@/lib/validation/scenario-quantity";
import { ruleSchema } from "@/lib/validation/scenario-rule";
import { plainText } from "@/lib/validation/text";

/** Default ids of logged harvests and drains, so applications and adjustments can name the lot. */
export const scenarioHarvestId = (binId: string, date: string) => `${binId}:harvest:${date}`;
export const scenarioDrainId = (binId: string, date: string) => `${binId}:drain:${date}`;

// A whole garden in one JSON file: what `npm run plan` reads and what the app
// exports and imports. Sizes carry their unit ({ value, unit }); the engine
// gets SI through lib/scenario/to-inputs.ts. Every error names its JSON path.

export const SCENARIO_FORMAT = "castline-scenario";

const id = z.string().trim().min(1).max(100);
const month = z.number().int().min(1).max(12);
/** Rules of one planting or crop, in order (castings monthly and tea every two weeks). */
const rulesSchema = z.array(ruleSchema).max(20);

function isTimeZone(tz: string): boolean {
  try {
    new Intl.DateTimeFormat("en-US", { timeZone: tz });
    return true;
  } catch {
    return false;
  }
}

const settingsSchema = z
  .object({
    unitSystem: unitSystemSchema,
    timeZone: z
      .string()
      .refine(isTimeZone, "is not a time zone we know (use an IANA name such as America/Chicago)"),
    lastSpringFrost: z.string(),
    firstFallFrost: z.string(),
    /** Last day of logged history; forecasts start the day after. */
    asOf: isoDateSchema.optional(),
    pricePerLb: z.number().finite().nonnegative().max(1000).optional(),
    shelfLifeDays: z.number().int().min(1).max(3650).optional(),
    /** Days leachate (collected or drained) is still used; default 7 (from memory). */
    liquidMaxAgeDays: z.number().int().min(1).max(90).optional(),
    teaCastingsPerWater: z.number().finite().positive().max(2).optional(),
  })
  .strict()
  .superRefine((s, ctx) => {
    const season = gardenSeasonSchema.safeParse({
      lastSpringFrost: s.lastSpringFrost,
      firstFallFrost: s.firstFallFrost,
    });
    if (!season.success) {
      for (const issue of season.error.issues)
        ctx.addIssue({ code: "custom", path: issue.path, message: issue.message });
    }
  });

const side = quantitySchema("length", GEOMETRY_LIMITS.traySideM);
const traySchema = z.union([
  z
    .object({
      inside: z
        .object({
          length: side,
          width: side,
          depth: quantitySchema("length", GEOMETRY_LIMITS.trayDepthM),
        })
        .strict(),
    })
    .strict(),
  z
    .object({
      outside: z.object({ length: side, width: side }).strict(),
      board: nominalBoardSchema,
    })
    .strict(),
]);

const binSchema = z
  .object({
    id,
    name: z.string().max(100).optional(),
    startDate: isoDateSchema,
    trays: z.number().int().min(1).max(20),
    tray: traySchema,
    rotationIntervalDays: z.number().finite().positive().max(365).optional(),
    processingDays: z.number().finite().positive().max(730).optional(),
    fillFraction: z.number().finite().positive().max(1).optional(),
    bulkDensityKgPerL: z.number().finite().positive().max(2).optional(),
    dormantMonths: z.array(month).max(11).optional(),
    manureFeedstock: z.boolean().optional(),
    worms: z.number().int().nonnegative().max(10_000_000).optional(),
    leachateEstimatePerWeek: quantitySchema("volume", 1000, true).optional(),
    /** Food eaten per day as a fraction of the worms' own mass. */
    intakeFractionPerDay: z.number().finite().positive().max(5).optional(),
    /** Most worm mass per area of occupied tray surface, e.g. { value: 2, unit: "lb", per: "ft2" }. */
    densityCeiling: ratioSchema("mass", "area", 100).optional(),
    /** Last day the bin is in use. */
    retiredOn: isoDateSchema.optional(),
    /** Days between drains of the base. */
    drainIntervalDays: z.number().int().min(1).max(365).optional(),
    logs: z
      .object({
        harvests: z
          .array(
            z
              .object({
                /** Lot id for applications that name it; default "<bin>:harvest:<date>". */
                id: id.optional(),
                date: isoDateSchema,
                amount: quantitySchema("mass", 10_000, true),
                predicted: quantitySchema("mass", 10_000, true).optional(),
              })
              .strict(),
          )
          .max(1000)
          .optional(),
        leachate: z
          .array(
            z
              .object({
                id: id.optional(),
                date: isoDateSchema,
                volume: quantitySchema("volume", 1000, true),
              })
              .strict(),
          )
          .max(5000)
          .optional(),
      })
      .strict()
      .optional(),
  })
  .strict()
  .superRefine((b, ctx) => {
    if (b.retiredOn !== undefined && b.retiredOn < b.startDate)
      ctx.addIssue({
        code: "custom",
        path: ["retiredOn"],
        message: "must not be before startDate",
      });
  });

const bedSchema = z.discriminatedUnion("kind", [
  z
    .object({
      id,
      name: z.string().max(100).optional(),
      kind: z.literal("bed"),
      indoor: z.boolean().optional(),
      length: quantitySchema("length", GEOMETRY_LIMITS.bedSideM),
      width: quantitySchema("length", GEOMETRY_LIMITS.bedSideM),
      notes: z.string().max(1000).optional(),
    })
    .strict(),
  z
    .object({
      id,
      name: z.string().max(100).optional(),
      kind: z.literal("container"),
      indoor: z.boolean().optional(),
      volume: quantitySchema("volume", GEOMETRY_LIMITS.containerVolumeL),
      notes: z.string().max(1000).optional(),
    })
    .strict(),
]);

const plantingSchema = z
  .object({
    id,
    bedId: id,
    crop: z.string().max(100).optional(),
    feederClass: feederClassSchema,
    plantCount: z.number().int().min(1).max(100_000),
    startDate: isoDateSchema,
    endDate: isoDateSchema.optional(),
    harvestDate: isoDateSchema.optional(),
    priority: z.number().finite().min(0).max(100).optional(),
    edible: z.boolean().optional(),
    edibleTouchesSoil: z.boolean().optional(),
    /** The planting's own rules, replacing its crop's; absent or [] = the crop's (crops[]), else the feeder class default. */
    rules: rulesSchema.optional(),
    /** One rule, as files written before `rules` have it: read as `rules: [rule]`. */
    rule: ruleSchema.optional(),
  })
  .strict()
  .superRefine((p, ctx) => {
    if (p.endDate !== undefined && p.endDate < p.startDate) {
      ctx.addIssue({ code: "custom", path: ["endDate"], message: "must not be before startDate" });
    }
    if (p.rule !== undefined && p.rules !== undefined)
      ctx.addIssue({ code: "custom", path: ["rule"], message: "give either rule or rules" });
  });

/** The rules a planting gives itself: `rules`, or an older file's single `rule`. */
export const ownRulesOf = (p: ScenarioPlanting) => p.rules ?? (p.rule ? [p.rule] : []);

/**
 * A crop of the garden's list: its facts, typical days to harvest and spacing,
 * and the rules its plantings inherit. A planting belongs to the crop with the
 * same name, feeder class and edible facts (cropKey).
 */
const cropSchema = z
  .object({
    name: z.string().trim().min(1).max(100),
    feederClass: feederClassSchema,
    edible: z.boolean().optional(),
    edibleTouchesSoil: z.boolean().optional(),
    daysToHarvest: z.number().int().min(1).max(1000).optional(),
    spacing: quantitySchema("length", 10).optional(),
    rules: rulesSchema.optional(),
  })
  .strict();

/** Which crop a planting (or crop entry) is: the same facts a garden's crop row holds. */
export function cropKey(c: {
  crop?: string | null;
  name?: string | null;
  feederClass: string;
  edible?: boolean;
  edibleTouchesSoil?: boolean;
}): string {
  return JSON.stringify([
    c.name ?? c.crop ?? null,
    c.feederClass,
    c.edible ?? true,
    c.edibleTouchesSoil ?? false,
  ]);
}

const lotSchema = z
  .object({
    id,
    binId: id.optional(),
    material: z.enum(["castings", "leachate"]).optional(),
    madeOn: isoDateSchema,
    amount: quantitySchema(["mass", "volume"], 100_000, true),
    manureFeedstock: z.boolean().optional(),
    /** Bought castings: what was paid per kg, in the garden's currency. */
    pricePerKg: z.number().finite().nonnegative().max(1000).optional(),
    note: z.string().max(300).optional(),
  })
  .strict();

const applicationSchema = z
  .object({
    id: id.optional(),
    plantingId: id,
    date: isoDateSchema,
    material: z.enum(["castings", "leachate", "tea"]),
    method: z.enum(["top-dress", "side-dress", "soil-mix", "drench"]),
    /** As applied: castings by mass or volume, liquids by volume (diluted solution, brewed tea). */
    amount: quantitySchema(["mass", "volume"], 10_000, true),
    plannedFeedingId: z.string().max(300).optional(),
    draws: z
      .array(
        z.object({ lotId: id, amount: quantitySchema(["mass", "volume"], 10_000, true) }).strict(),
      )
      .max(50)
      .optional(),
  })
  .strict();

/** A lot changed by hand on a date: negative takes away (spilled, given away), positive adds. */
const adjustmentSchema = z
  .object({
    id: id.optional(),
    lotId: id,
    date: isoDateSchema,
    amount: quantitySchema(["mass", "volume"], 100_000, false, "nonzero"),
    // The database's stock_adjustment_reason values (db/schema/enums.ts).
    reason: z.enum(["spilled", "given-away", "spoiled", "correction"]),
    note: z.string().max(2000).optional(),
  })
  .strict();

const logsSchema = z
  .object({
    applications: z.array(applicationSchema).max(100_000).optional(),
    adjustments: z.array(adjustmentSchema).max(10_000).optional(),
    wormMoves: z
      .array(
        z
          .object({
            id: id.optional(),
            date: isoDateSchema,
            fromBinId: id.optional(),
            toBinId: id.optional(),
            worms: z.number().int().min(1).max(10_000_000),
          })
          .strict(),
      )
      .max(10_000)
      .optional(),
    observations: z
      .array(
        z
          .object({
            id: id.optional(),
            binId: id,
            date: isoDateSchema,
            wormCount: z.number().int().nonnegative().max(10_000_000).optional(),
            temperatureC: z.number().finite().min(-50).max(80).optional(),
            moisturePercent: z.number().finite().min(0).max(100).optional(),
            note: z.string().max(2000).optional(),
          })
          .strict(),
      )
      .max(10_000)
      .optional(),
  })
  .strict();

export const scenarioSchema = z
  .object({
    format: z.literal(SCENARIO_FORMAT),
    version: z.literal(1),
    garden: z
      .object({
        name: z.string().trim().min(1).max(80),
        location: plainText().max(200).optional(),
      })
      .strict(),
    settings: settingsSchema,
    bins: z.array(binSchema).max(50),
    beds: z.array(bedSchema).max(5000),
    crops: z.array(cropSchema).max(5000).optional(),
    plantings: z.array(plantingSchema).max(20_000),
    stock: z
      .object({ lots: z.array(lotSchema).max(1000) })
      .strict()
      .optional(),
    logs: logsSchema.optional(),
  })
  .strict()
  .superRefine((s, ctx) => crossCheck(s, ctx));

function crossCheck(s: z.infer<typeof scenarioSchema>, ctx: z.RefinementCtx): void {
  const dupes = (list: { id: string }[], path: string) => {
    const seen = new Set<string>();
    list.forEach((x, i) => {
      if (seen.has(x.id))
        ctx.addIssue({ code: "custom", path: [path, i, "id"], message: `duplicate id "${x.id}"` });
      seen.add(x.id);
    });
  };
  dupes(s.bins, "bins");
  dupes(s.beds, "beds");
  dupes(s.plantings, "plantings");
  const cropKeys = new Set<string>();
  (s.crops ?? []).forEach((c, i) => {
    const key = cropKey(c);
    if (cropKeys.has(key))
      ctx.addIssue({
        code: "custom",
        path: ["crops", i, "name"],
        message: `crop "${c.name}" is listed twice with the same facts`,
      });
    cropKeys.add(key);
  });
  const beds = new Map(s.beds.map((b) => [b.id, b]));
  const bins = new Set(s.bins.map((b) => b.id));
  const cropRules = new Map((s.crops ?? []).map((c) => [cropKey(c), c.rules ?? []]));
  s.plantings.forEach((p, i) => {
    const bed = beds.get(p.bedId);
    if (!bed)
      return ctx.addIssue({
        code: "custom",
        path: ["plantings", i, "bedId"],
        message: `no bed with id "${p.bedId}"`,
      });
    // The rules it is fed by: its own, else its crop's; none = the default, which never ends.
    const own = ownRulesOf(p);
    const rules = own.length ? own : (cropRules.get(cropKey(p)) ?? []);
    let bounded = rules.length > 0;
    try {
      bounded &&= rules.every((r) => isBoundedRule(r.recurrence));
    } catch {
      return; // the rule's own error is already reported at its recurrence
    }
    // Outdoors the growing season ends an open-ended rule; indoors nothing does.
    if (!bounded && p.endDate === undefined && bed.indoor) {
      ctx.addIssue({
        code: "custom",
        path: ["plantings", i, "endDate"],
        message:
          "is needed: a rule never ends (no COUNT or UNTIL) and an indoor bed has no growing season to end it",
      });
    }
  });
  const plantings = new Set(s.plantings.map((p) => p.id));
  (s.logs?.applications ?? []).forEach((a, i) => {
    if (!plantings.has(a.plantingId))
      ctx.addIssue({
        code: "custom",
        path: ["logs", "applications", i, "plantingId"],
        message: `no planting with id "${a.plantingId}"`,
      });
  });
  (s.logs?.wormMoves ?? []).forEach((m, i) => {
    for (const key of ["fromBinId", "toBinId"] as const) {
      const v = m[key];
      if (v !== undefined && !bins.has(v))
        ctx.addIssue({
          code: "custom",
          path: ["logs", "wormMoves", i, key],
          message: `no bin with id "${v}"`,
        });
    }
  });
  const lotIds = new Set([
    ...(s.stock?.lots ?? []).map((l) => l.id),
    ...s.bins.flatMap((b) => [
      ...(b.logs?.harvests ?? []).map((h) => h.id ?? scenarioHarvestId(b.id, h.date)),
      ...(b.logs?.leachate ?? []).map((d) => d.id ?? scenarioDrainId(b.id, d.date)),
    ]),
  ]);
  (s.logs?.adjustments ?? []).forEach((a, i) => {
    if (!lotIds.has(a.lotId))
      ctx.addIssue({
        code: "custom",
        path: ["logs", "adjustments", i, "lotId"],
        message: `no stock lot, logged harvest or drain with id "${a.lotId}"`,
      });
  });
  (s.stock?.lots ?? []).forEach((lot, i) => {
    if (lot.binId !== undefined && !bins.has(lot.binId)) {
      ctx.addIssue({
        code: "custom",
        path: ["stock", "lots", i, "binId"],
        message: `no bin with id "${lot.binId}"`,
      });
    }
  });
}

export type Scenario = z.infer<typeof scenarioSchema>;
export type ScenarioBin = Scenario["bins"][number];
export type ScenarioBed = Scenario["beds"][number];
export type ScenarioPlanting = Scenario["plantings"][number];
export type ScenarioCrop = NonNullable<Scenario["crops"]>[number];

export interface ScenarioIssue {
  path: string; // e.g. "bins[0].tray.inside.length.unit"
  message: string;
}

export function formatPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const p of path) out += typeof p === "number" ? `[${p}]` : `${out ? "." : ""}${String(p)}`;
  return out || "(root)";
}

/**
 * zod reports a failed union as one issue at the union's path; a grower needs
 * the field inside it. Take the branch that came closest (fewest issues).
 */
function flatten(issue: z.core.$ZodIssue, base: readonly PropertyKey[] = []): ScenarioIssue[] {
  const path = [...base, ...issue.path];
  if (issue.code === "invalid_union" && issue.errors.length > 0) {
    const best = [...issue.errors].sort((a, b) => a.length - b.length)[0] ?? [];
    if (best.length > 0) return best.flatMap((i) => flatten(i, path));
  }
  return [{ path: formatPath(path), message: issue.message }];
}

export function parseScenario(
  input: unknown,
): { ok: true; scenario: Scenario } | { ok: false; issues: ScenarioIssue[] } {
  const r = scenarioSchema.safeParse(input);
  if (r.success) return { ok: true, scenario: r.data };
  return { ok: false, issues: r.error.issues.flatMap((i) => flatten(i)) };
}
