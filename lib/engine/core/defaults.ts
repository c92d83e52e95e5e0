import { toSi } from "@/lib/units";
// Every default the engine uses, with where the number comes from (as cited in
// the product brief). The UI shows `source` beside an overridable value, and a
// forecast's explanation can say which defaults it leaned on.

export interface Sourced<T = number> {
  value: T;
  source: string;
}

const CUP_L = toSi(1, "cup"); // 236.5882365 mL (NIST Handbook 44 App. C, via lib/units)
const INCH_M = toSi(1, "in"); // 2.54 cm exactly

export const DEFAULTS = {
  rotationIntervalDays: {
    value: 30,
    source: "common practice: one tray added about monthly",
  },
  processingDays: {
    value: 90,
    source: "MSU Extension; Oregon State EM 9034 (2–6 months)",
  },
  fillFraction: {
    value: 0.9,
    source: "common practice: a finished tray is filled to about nine tenths",
  },
  castingsBulkDensityKgPerL: {
    value: 0.7,
    source:
      "vermicompost 0.7–0.9 g/cm³ at 15–25 % moisture (India Fertiliser Control Order); wet compost 0.5–0.9 g/cm³ (Agnew & Leonard 2003, Compost Sci. & Util. 11(3))",
  },
  calibrationHarvests: {
    value: 4,
    source: "our choice: the most recent 4 logged harvests",
  },
  leachateTrailingDays: {
    value: 60,
    source: "our choice: trailing mean over the last 60 days of logs",
  },
  leachateEstimateLPerWeek: {
    value: 0.5,
    source: "from memory, a rough guess for a small stacked bin; edit it once you collect",
  },
  leachateDilutionWaterParts: {
    value: 10,
    source: "1 part leachate to 10 parts water by volume (Arthur et al., HortScience)",
  },
  teaCastingsPerWater: {
    value: 0.1,
    source: "10 % solution (Arancon, via conference notes)",
  },
  teaBrewHours: {
    value: 24,
    source: "24 h brew; tea keeps only hours (PRODUCT.md)",
  },
  wormIntakeFractionPerDay: {
    value: 0.25,
    source:
      '25–50 % of body weight per day (Alabama Extension); "2 lb worms eat about 1 lb food a day" (Univ. of Illinois Extension)',
  },
  surfaceFt2PerLbFoodPerWeek: {
    value: 1,
    source: "1 ft² per lb of food per week (MSU Extension; NC State AG-473-18)",
  },
  cocoonsPerAdultPerWeek: {
    value: 2.5,
    source:
      "2–3.8 per adult per week (Edwards 1988 via Domínguez & Edwards 2011; Eurasian J. Soil Sci. 14(2) 2025)",
  },
  incubationDays: {
    value: 23,
    source:
      "cocoons hatch after 20–24 days (life-cycle figures: Edwards 1988 via Domínguez & Edwards 2011)",
  },
  hatchSuccess: {
    value: 0.85,
    source:
      "~85 % of cocoons hatch (life-cycle figures: Edwards 1988 via Domínguez & Edwards 2011)",
  },
  hatchlingsPerCocoon: {
    value: 3,
    source:
      "2.4–3.3 hatchlings per cocoon (life-cycle figures: Edwards 1988 via Domínguez & Edwards 2011)",
  },
  maturationDays: {
    value: 60,
    source:
      "juveniles mature after 53–76 days (life-cycle figures: Edwards 1988 via Domínguez & Edwards 2011)",
  },
  densityCeilingLbPerFt2: {
    value: 2,
    source: "~2 lb worms per ft² (optimum 1–2, rare max 4), common practice",
  },
  wormsPerLb: {
    value: 1000,
    source: "about 1,000 worms per lb (from memory; 825/lb from a 0.55 g adult)",
  },
  heavyCastingsPerPlantL: {
    value: CUP_L,
    source: "common practice: ¾–1 cup castings per plant per month for heavy feeders",
  },
  mediumCastingsPerPlantL: { value: CUP_L / 2, source: "common practice: ½ cup per plant monthly" },
  lightCastingsPerPlantL: {
    value: CUP_L / 2,
    source: "common practice: ½ cup per plant every two months",
  },
  teaPerPlantL: {
    value: 0.1,
    source: "100 mL of 10 % solution per plant weekly (Arancon, via conference notes)",
  },
  bedTopDressDepthM: {
    value: 0.25 * INCH_M,
    source: "beds top-dressed ¼–½ in (compost top-dressing ¼–⅜ in, Cumberland County SWCD)",
  },
  pottingMixCastingsPercent: {
    value: 10,
    source: "potting mix 10–20 % castings by volume (Atiyeh et al. 2000, Pedobiologia 44)",
  },
  pottingMixWarnAbovePercent: {
    value: 20,
    source: "warn above 20 % castings by volume (Atiyeh et al. 2000, Pedobiologia 44)",
  },
  castingsShelfLifeDays: {
    value: 60,
    source: "quality fell after 60 days (Harit et al. 2014, J. Applied Horticulture 16(2))",
  },
  liquidMaxAgeDays: {
    value: 7,
    source: "from memory: collected leachate is used within about a week; edit per garden",
  },
  pricePerLb: {
    value: 1.0,
    source: "common retail price of castings, about $1.00 per lb (from memory)",
  },
  foodKgPerCastingsKg: {
    value: 1,
    source:
      "our choice, a floor: a tray of castings took at least its own mass of food and bedding (worms lose mass as they digest, so the real figure is higher)",
  },
  plantingPriority: {
    value: 3,
    source: "our choice: the middle of 1 (fed first) to 5",
  },
  startBinWorms: {
    value: 2000,
    source: "common practice: a new stacked bin is started with about 2,000 worms (about 2 lb)",
  },
  startBinTrays: {
    value: 4,
    source: "common practice: a four-tray stack",
  },
  preHarvestDaysSoilContact: {
    value: 120,
    source:
      "raw manure: 120 days before harvest when the edible part touches soil (7 CFR 205.203(c)(1), USDA NOP)",
  },
  preHarvestDaysOther: {
    value: 90,
    source: "raw manure: 90 days before harvest otherwise (7 CFR 205.203(c)(1), USDA NOP)",
  },
} as const satisfies Record<string, Sourced>;

export type DefaultName = keyof typeof DEFAULTS;

/** The default value of a parameter (a number), for terse use in the engine. */
export function dflt(name: DefaultName): number {
  return DEFAULTS[name].value;
}
