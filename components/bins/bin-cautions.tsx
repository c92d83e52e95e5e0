import { CautionNote } from "@/components/cautions/caution-note";
import {
  handsAndDustCaution,
  LIFT_LIMIT_KG,
  LOCAL_RULES_NOTE,
  liftingCaution,
  preHarvestCaution,
  temperatureCaution,
  wormFoodCaution,
} from "@/lib/cautions";
import type { UnitSystem } from "@/lib/units";

// The cautions that apply to one bin, worded in lib/cautions.ts.
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
  return (
    <div className="flex flex-col gap-3">
      <CautionNote
        caution={liftingCaution(system, fullTrayKg)}
        tone={fullTrayKg > LIFT_LIMIT_KG ? "caution" : "info"}
      />
      {manureFeedstock ? <CautionNote caution={preHarvestCaution()} /> : null}
      <CautionNote caution={temperatureCaution(system, indoors)} tone="info" />
      <CautionNote caution={wormFoodCaution()} tone="info" />
      <CautionNote caution={handsAndDustCaution()} tone="info" />
      <p className="text-sm text-soil-700">{LOCAL_RULES_NOTE}</p>
    </div>
  );
}
