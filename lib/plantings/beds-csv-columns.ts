import type { Quantity, UnitName, UnitSystem } from "@/lib/units";
import { isUnitName, quantityOf } from "@/lib/units";

// The beds-and-plantings CSV: one row per planting, its bed's columns repeated
// on each row (a bed with nothing planted is a row with the planting columns
// blank). Sizes carry their unit in the header ("Length (ft)"), so a file in
// metres and one in feet both read; every cell of a column is in that one unit.

export type ColumnKey =
  | "bed"
  | "kind"
  | "indoors"
  | "length"
  | "width"
  | "depth"
  | "volume"
  | "bedNotes"
  | "crop"
  | "plants"
  | "plantedOn"
  | "expectedEnd"
  | "priority"
  | "plantingNotes";

export interface ColumnDef {
  key: ColumnKey;
  title: string;
  /** Sizes: the header names a unit of this quantity. */
  quantity?: Quantity;
  /** A file without this column is refused (the others may be left out). */
  required?: boolean;
}

export const BED_CSV_COLUMNS: ColumnDef[] = [
  { key: "bed", title: "Bed", required: true },
  { key: "kind", title: "Kind", required: true },
  { key: "indoors", title: "Indoors" },
  { key: "length", title: "Length", quantity: "length", required: true },
  { key: "width", title: "Width", quantity: "length", required: true },
  { key: "depth", title: "Depth", quantity: "length" },
  { key: "volume", title: "Volume", quantity: "volume", required: true },
  { key: "bedNotes", title: "Bed notes" },
  { key: "crop", title: "Crop", required: true },
  { key: "plants", title: "Plants", required: true },
  { key: "plantedOn", title: "Planted on", required: true },
  { key: "expectedEnd", title: "Expected end" },
  { key: "priority", title: "Priority" },
  { key: "plantingNotes", title: "Planting notes" },
];

/** The units a template and an export use, by the garden's unit system. */
export function csvUnits(
  system: UnitSystem,
): Record<"length" | "width" | "depth" | "volume", UnitName> {
  return system === "us"
    ? { length: "ft", width: "ft", depth: "in", volume: "gal" }
    : { length: "m", width: "m", depth: "cm", volume: "L" };
}

export function headerRow(system: UnitSystem): string[] {
  const units = csvUnits(system);
  return BED_CSV_COLUMNS.map((c) =>
    c.quantity ? `${c.title} (${units[c.key as keyof typeof units]})` : c.title,
  );
}

/** Where each column sits in the file, with its unit and its header as written (errors name it). */
export interface HeaderMap {
  index: Partial<Record<ColumnKey, number>>;
  unit: Partial<Record<ColumnKey, UnitName>>;
  title: Record<ColumnKey, string>;
}

const HEADER = /^(.*?)\s*(?:\(\s*([^()]*?)\s*\))?$/;

/** Reads the header row; problems name the column as written (or the one missing). */
export function readHeader(cells: string[]): {
  map: HeaderMap;
  problems: { column: string; message: string }[];
} {
  const problems: { column: string; message: string }[] = [];
  const map: HeaderMap = {
    index: {},
    unit: {},
    title: Object.fromEntries(BED_CSV_COLUMNS.map((c) => [c.key, c.title])) as Record<
      ColumnKey,
      string
    >,
  };
  cells.forEach((raw, i) => {
    const written = raw.trim();
    if (!written) return;
    const [, name = "", unit] = HEADER.exec(written) ?? [];
    const def = BED_CSV_COLUMNS.find((c) => c.title.toLowerCase() === name.toLowerCase());
    if (!def) {
      problems.push({
        column: written,
        message: `"${written}" is not a column we know; the columns are ${BED_CSV_COLUMNS.map((c) => c.title).join(", ")}.`,
      });
      return;
    }
    if (map.index[def.key] !== undefined) {
      problems.push({ column: written, message: `"${def.title}" appears twice.` });
      return;
    }
    if (def.quantity) {
      if (!unit || !isUnitName(unit) || quantityOf(unit) !== def.quantity) {
        problems.push({
          column: written,
          message: `Say the unit in the header, as a ${def.quantity} unit, e.g. "${def.title} (${def.quantity === "volume" ? "gal" : "ft"})".`,
        });
        return;
      }
      map.unit[def.key] = unit;
    } else if (unit !== undefined) {
      problems.push({ column: written, message: `"${def.title}" takes no unit.` });
      return;
    }
    map.index[def.key] = i;
    map.title[def.key] = written;
  });
  for (const c of BED_CSV_COLUMNS)
    if (
      c.required &&
      map.index[c.key] === undefined &&
      !problems.some((p) => p.column.toLowerCase().startsWith(c.title.toLowerCase()))
    )
      problems.push({ column: c.title, message: `The "${c.title}" column is missing.` });
  return { map, problems };
}
