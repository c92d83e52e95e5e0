import { Alert } from "@/components/ui";
import { formatAmount, formatTemperature } from "@/lib/format-quantity";
import type { UnitSystem } from "@/lib/units";

// The cautions that apply to one bin, in plain words.

/** Load constant of the NIOSH Revised Lifting Equation, 23 kg (Waters et al. 1993; from memory). */
const LIFT_LIMIT_KG = 23;
/** Comfortable band for composting worms, 55–77 °F (PRODUCT brief for issue 11; common practice). */
const BAND_F = { low: 55, high: 77 };
const fToC = (f: number) => ((f - 32) * 5) / 9;

export function BinCautions({
  fullTrayKg,
  manureFeedstock,
  indoors,
  system,
}: {
  fullTrayKg: number;
  manureFeedstock: boolean;
  indoors: boolean;
  system: UnitSystem;
}) {
  const heavy = fullTrayKg > LIFT_LIMIT_KG;
  return (
    <div className="flex flex-col gap-3">
      <Alert tone={heavy ? "caution" : "info"} title="Lifting a full tray">
        A full tray of this bin weighs about {formatAmount(fullTrayKg, "castings-mass", system)} of
        castings, more when wet.{" "}
        {heavy
          ? "That is more than one person should lift: lift it with two people, or scoop half into a bucket first."
          : "Lift with a straight back, close to your body."}
      </Alert>
      {manureFeedstock ? (
        <Alert tone="caution" title="Manure in the feedstock">
          Castings and liquid from this bin are treated like raw manure: none goes on crops whose
          edible part touches the soil within 120 days of their harvest, or 90 days for other edible
          crops (7 CFR 205.203(c)(1)). Castline keeps these lots off such plantings for you.
        </Alert>
      ) : null}
      <Alert tone="info" title="Temperature">
        Worms work best between {formatTemperature(fToC(BAND_F.low), system)} and{" "}
        {formatTemperature(fToC(BAND_F.high), system)}.{" "}
        {indoors
          ? "Keep the bin away from heaters and sunny windows."
          : "Shade it in summer and insulate or bring it in before frost."}
      </Alert>
      <Alert tone="info" title="Hands and dust">
        Wear gloves and wash your hands after working the bin; dampen dry castings before you sift
        them, and work outdoors.
      </Alert>
    </div>
  );
}
