import { CautionLine } from "@/components/cautions/caution-note";
import { liquidsCaution, preHarvestCaution } from "@/lib/cautions";

// Shown under feedings of leachate or tea, and under feedings held back before
// harvest (worded in lib/cautions.ts).

export function LiquidCaution() {
  return <CautionLine caution={liquidsCaution()} />;
}

export function PreHarvestCaution() {
  return <CautionLine caution={preHarvestCaution()} />;
}
