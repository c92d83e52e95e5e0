// Cautions the product shows beside liquid feedings and pre-harvest blocks
// (PRODUCT.md "Cautions"; Duffy et al., USDA-ARS on molasses; 7 CFR 205.203(c)(1)).

export function LiquidCaution() {
  return (
    <p className="text-sm text-clay-800" data-testid="liquid-caution">
      Leachate and tea: pour as a soil drench, not on the edible leaves of greens near harvest, and
      never add molasses (it feeds harmful bacteria). Follow your local codes.
    </p>
  );
}

export function PreHarvestCaution() {
  return (
    <p className="text-sm text-clay-800" data-testid="pre-harvest-caution">
      Stock from a bin fed manure is kept off edible crops for 120 days before harvest when the
      edible part touches the soil, and 90 days otherwise (USDA organic rule, 7 CFR 205.203). Follow
      your local codes.
    </p>
  );
}
