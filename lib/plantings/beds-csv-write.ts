import { spreadsheetCsv, type CsvCell } from "@/lib/csv";
import { fromSi, type UnitSystem } from "@/lib/units";
import type { BedShape } from "@/lib/validation/bed";
import { csvUnits, headerRow } from "./beds-csv-columns";

// Beds and plantings out as CSV, in the format the import reads
// (lib/plantings/beds-csv-columns.ts), sizes in the garden's units.

export interface BedCsvLine {
  bed: BedShape;
  planting: {
    cropName: string;
    plantCount: number;
    plantedOn: string;
    expectedHarvestOn: string | null;
    priority: "high" | "normal" | "low";
    notes: string | null;
  } | null;
}

/** 3 decimals in the column's unit: finer than anyone measures a bed, and what the import's match allows for. */
const round = (siValue: number | null, unit: string): CsvCell =>
  siValue === null ? "" : Number(fromSi(siValue, unit).toFixed(3));

export function bedsCsv(lines: BedCsvLine[], system: UnitSystem): string {
  const u = csvUnits(system);
  const rows: CsvCell[][] = lines.map(({ bed, planting }) => [
    bed.name,
    bed.kind,
    bed.indoors ? "yes" : "no",
    bed.kind === "bed" ? round(bed.lengthM, u.length) : "",
    bed.kind === "bed" ? round(bed.widthM, u.width) : "",
    round(bed.depthM, u.depth),
    bed.kind === "container" ? round(bed.containerVolumeL, u.volume) : "",
    bed.notes ?? "",
    planting?.cropName ?? "",
    planting?.plantCount ?? "",
    planting?.plantedOn ?? "",
    planting?.expectedHarvestOn ?? "",
    planting?.priority ?? "",
    planting?.notes ?? "",
  ]);
  return spreadsheetCsv([headerRow(system), ...rows]);
}

/** The template: the header and three example rows (an 8 × 4 ft bed with 6 tomato and 4 pepper, a 5-gallon pot). */
export function bedsCsvTemplate(system: UnitSystem, year: number): string {
  const us = system === "us";
  const bed = {
    name: "Raised bed 1",
    kind: "bed" as const,
    indoors: false,
    lengthM: us ? 8 * 0.3048 : 2.4,
    widthM: us ? 4 * 0.3048 : 1.2,
    depthM: null,
    containerVolumeL: null,
    notes: null,
  };
  const pot = {
    ...bed,
    name: "Porch pot",
    kind: "container" as const,
    lengthM: null,
    widthM: null,
    containerVolumeL: us ? 5 * 3.785411784 : 20,
  };
  const planting = (cropName: string, plantCount: number) => ({
    cropName,
    plantCount,
    plantedOn: `${year}-05-15`,
    expectedHarvestOn: null,
    priority: "normal" as const,
    notes: null,
  });
  return bedsCsv(
    [
      { bed, planting: planting("Tomato", 6) },
      { bed, planting: planting("Pepper", 4) },
      { bed: pot, planting: planting("Basil", 3) },
    ],
    system,
  );
}
