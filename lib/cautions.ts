import { formatAmount, formatTemperature } from "@/lib/format-quantity";
import { fahrenheitToCelsius, type UnitSystem } from "@/lib/units";

// The one place the cautions Castline shows are worded (PRODUCT.md "Cautions").
// Bodies are in a grower's words and in the garden's units; where a figure comes
// from goes in `sources`, shown behind a "Sources" disclosure. Castline gives the
// arithmetic; local rules and licensed advice have the last word.

export type CautionId =
  "lifting" | "liquids" | "pre-harvest" | "hands-and-dust" | "worm-food" | "temperature";

export interface Caution {
  id: CautionId;
  title: string;
  /** Plain words, no citations; quantities already in the garden's units. */
  body: string;
  /** Where the advice and its figures come from. */
  sources: readonly string[];
}

/** Load constant of the NIOSH Revised Lifting Equation: 23 kg (51 lb) (Waters et al. 1993; from memory). */
export const LIFT_LIMIT_KG = 23;

/**
 * Comfortable band for composting worms: 55–77 °F (PRODUCT.md, after NC State
 * Extension), kept in °C like every temperature inside Castline.
 */
export const WORM_BAND_C = { low: fahrenheitToCelsius(55), high: fahrenheitToCelsius(77) };

/** Said once under each group of cautions: we defer to local rules and licensed practice. */
export const LOCAL_RULES_NOTE =
  "These are general notes. Your local rules and a licensed adviser have the last word.";

/** Lifting a full tray of castings; `fullTrayKg` is the bin's own, when known. */
export function liftingCaution(system: UnitSystem, fullTrayKg?: number): Caution {
  const limit = formatAmount(LIFT_LIMIT_KG, "castings-mass", system);
  const heavy = fullTrayKg !== undefined && fullTrayKg > LIFT_LIMIT_KG;
  const weight =
    fullTrayKg === undefined
      ? "A full tray of castings is heavy, more so when wet."
      : `A full tray of this bin holds about ${formatAmount(fullTrayKg, "castings-mass", system)} of castings, more when wet.`;
  const advice = heavy
    ? `That is more than the ${limit} one person should lift: lift it with two people, or scoop half into a bucket first.`
    : `Lift with a straight back, close to your body; above about ${limit}, lift with two people or split the load.`;
  return {
    id: "lifting",
    title: "Lifting a full tray",
    body: `${weight} ${advice}`,
    sources: [
      "NIOSH Revised Lifting Equation (Waters et al., 1993): its load constant is the most one person should lift in ideal conditions.",
    ],
  };
}

export function liquidsCaution(): Caution {
  return {
    id: "liquids",
    title: "Leachate and worm tea",
    body: "Pour them on the soil around the plants, not over leaves you will eat, above all leafy greens close to harvest. Never add molasses or sugar to a brew: it feeds harmful bacteria.",
    sources: ["Duffy et al., USDA Agricultural Research Service, on compost tea and molasses."],
  };
}

export function preHarvestCaution(): Caution {
  return {
    id: "pre-harvest",
    title: "A bin fed manure",
    body: "Castings and liquid from a bin fed manure count as raw manure. Keep them off crops whose edible part touches the soil for the last 120 days before harvest, and off other food crops for the last 90 days. Castline holds such feedings back for you.",
    sources: ["USDA National Organic Program, 7 CFR 205.203(c)(1)."],
  };
}

export function handsAndDustCaution(): Caution {
  return {
    id: "hands-and-dust",
    title: "Gloves and dust",
    body: "Wear gloves and wash your hands after handling castings, compost or potting mix: they can carry germs that cause a lung infection. Dampen dry material before you sift it, work outdoors, and consider a dust mask.",
    sources: ["State health advisories on Legionella longbeachae in compost and potting mix."],
  };
}

export function wormFoodCaution(): Caution {
  return {
    id: "worm-food",
    title: "Feeding the worms",
    body: "Feed fruit and vegetable scraps, leafy greens, coffee grounds and shredded plain paper. Leave out meat, fish, dairy, oil, salty, spicy or citrus food, and pet droppings. Keep the bedding as damp as a wrung-out sponge.",
    sources: ["UF/IFAS Extension, USDA and EPA guidance on worm composting."],
  };
}

/** The worms' comfortable temperatures, with advice for where the bin stands. */
export function temperatureCaution(system: UnitSystem, indoors: boolean): Caution {
  const low = formatTemperature(WORM_BAND_C.low, system);
  const high = formatTemperature(WORM_BAND_C.high, system);
  return {
    id: "temperature",
    title: "Temperature",
    body: `Worms work best between ${low} and ${high}. ${
      indoors
        ? "Keep the bin away from heaters and sunny windows."
        : "Shade it in summer, and insulate it or bring it in before frost."
    }`,
    sources: ["NC State Extension, vermicomposting temperature range."],
  };
}
