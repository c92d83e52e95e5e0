import { Alert } from "@/components/ui";

// The cautions every garden sees (PRODUCT.md "Cautions"). Castline gives the
// arithmetic; local codes and licensed practice have the last word.
export function SafetyCautions() {
  return (
    <section aria-labelledby="cautions-title" className="flex flex-col gap-3">
      <h2 id="cautions-title" className="text-xl">
        Working safely
      </h2>
      <Alert tone="caution" title="Gloves and dust">
        Wear gloves and wash your hands after handling castings, compost or potting mix. They can
        carry Legionella longbeachae: dampen the material, work outdoors and consider a mask (state
        health advisories).
      </Alert>
      <Alert tone="caution" title="Liquids near harvest">
        Use leachate and worm tea as a soil drench, not on the edible parts of leafy greens near
        harvest. Never add molasses to a brew: it feeds pathogen regrowth (Duffy et al., USDA-ARS).
      </Alert>
      <Alert tone="caution" title="Full trays are heavy">
        A full tray of 1 ft³ at 45 lb/ft³ weighs about 45 lb, close to the NIOSH lifting
        equation&apos;s 51 lb load constant. Lift with two people or empty part of it first.
      </Alert>
      <Alert tone="info" title="Feeding the worms">
        Fruit and vegetable scraps, leafy greens, coffee grounds and shredded plain paper. No meat,
        fish, dairy, oil, salty, spicy or citrus food, and no pet manure (UF/IFAS, USDA, EPA
        guidance). Keep bedding as moist as a wrung sponge and the bin between 55 and 77 °F (NC
        State Extension).
      </Alert>
      <p className="text-sm text-soil-700">
        Manure-fed outputs follow pre-harvest intervals (7 CFR 205.203(c)(1)). These notes do not
        replace local codes or licensed advice.
      </p>
    </section>
  );
}
