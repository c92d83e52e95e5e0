import Link from "next/link";
import type { BedDto } from "@/db/queries/beds";
import { formatAmount } from "@/lib/format-quantity";
import type { UnitSystem } from "@/lib/units";

/** "8 × 4 ft · 32 ft²" or "5 gal": a bed's size in the garden's units. */
export function bedSize(bed: BedDto, system: UnitSystem): string {
  if (bed.kind === "container")
    return bed.containerVolumeL === null
      ? "—"
      : formatAmount(bed.containerVolumeL, "liquid", system);
  if (bed.lengthM === null || bed.widthM === null || bed.areaM2 === null) return "—";
  const l = formatAmount(bed.lengthM, "length", system);
  const w = formatAmount(bed.widthM, "length", system);
  return `${l.replace(/ \S+$/, "")} × ${w} · ${formatAmount(bed.areaM2, "area", system)}`;
}

export function BedList({
  gardenId,
  beds,
  unitSystem,
}: {
  gardenId: string;
  beds: BedDto[];
  unitSystem: UnitSystem;
}) {
  return (
    <ul className="grid gap-3 sm:grid-cols-2">
      {beds.map((bed) => (
        <li key={bed.id}>
          <Link
            href={`/g/${gardenId}/beds/${bed.id}`}
            className="flex min-h-11 flex-col gap-1 rounded-card border border-loam-300 bg-white p-4 hover:border-leaf-700 focus-visible:border-leaf-700"
          >
            <span className="text-lg font-semibold text-leaf-900 underline-offset-2 hover:underline">
              {bed.name}
            </span>
            <span className="text-sm text-soil-700">
              {bed.kind === "bed" ? "Bed" : "Container"} · {bedSize(bed, unitSystem)}
              {bed.indoors ? " · indoors" : ""}
            </span>
            <span className="text-sm text-soil-700">
              {bed.plantingCount === 0
                ? "No plantings yet"
                : `${bed.plantingCount} planting${bed.plantingCount === 1 ? "" : "s"}`}
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
