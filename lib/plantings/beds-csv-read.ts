import { parse } from "papaparse";
import { readCsvCell } from "@/lib/csv";
import { matchCrop } from "@/lib/plantings/quick-entry";
import { CROWDED_REFUSE_RATIO, cropFacts, crowding } from "@/lib/plantings/rules";
import { isUnitName, quantityOf, toSi, type UnitName } from "@/lib/units";
import { createBedSchema, type BedShape, type CreateBedInput } from "@/lib/validation/bed";
import { isoDay, MAX_PLANTS, prioritySchema, type Priority } from "@/lib/validation/planting";
import { si } from "@/lib/validation/scenario-quantity";
import { readHeader, type ColumnKey, type HeaderMap } from "./beds-csv-columns";

// Reads a beds-and-plantings CSV into what an import would write, or says per
// row and column what is wrong. Pure: the import page runs it for the preview
// and the route handler runs it again on the same text before writing.

/** A file with more data rows than this is refused: split it. */
export const MAX_CSV_ROWS = 5_000;

export interface CsvCrop {
  id: string;
  name: string | null;
  spacingM?: number | null;
  daysToHarvest?: number | null;
}

/** A garden's bed as the import checks rows against (its notes play no part). */
export interface CsvBed extends Omit<BedShape, "notes"> {
  id: string;
}

/** Row 1 is the header, as a spreadsheet numbers it. */
export interface CsvProblem {
  row: number;
  column: string;
  message: string;
}

export interface ImportedBed {
  /** The bed's name, lower-cased: rows name their bed by it. */
  key: string;
  row: number;
  input: CreateBedInput;
}

export interface ImportedPlanting {
  row: number;
  bedKey: string;
  /** An existing bed of the garden; null = one of the new beds. */
  bedId: string | null;
  cropId: string;
  plantCount: number;
  plantedOn: string;
  expectedEnd: string | null;
  priority: Priority;
  notes: string | null;
}

export interface BedsCsvRead {
  problems: CsvProblem[];
  newBeds: ImportedBed[];
  plantings: ImportedPlanting[];
  /** Rows that held data, and all-blank rows skipped (kept out of the numbering of nothing). */
  dataRows: number;
  blankRows: number;
}

export function parseCsvText(text: string): { records: string[][]; problems: CsvProblem[] } {
  // A spreadsheet's UTF-8 export often starts with a byte order mark: not part of the first header.
  const parsed = parse<string[]>(text.replace(/^\ufeff/, ""), { skipEmptyLines: false });
  const problems = parsed.errors.map((e) => ({
    row: (e.row ?? 0) + 1,
    column: "(whole row)",
    message: `The file is not well-formed CSV here: ${e.message}.`,
  }));
  return { records: parsed.data, problems };
}

export function readBedsCsv(text: string, ctx: { crops: CsvCrop[]; beds: CsvBed[] }): BedsCsvRead {
  const { records, problems } = parseCsvText(text);
  const read = readBedsCsvRecords(records, ctx);
  return { ...read, problems: [...problems, ...read.problems] };
}

const NUMBER = /^(\d+(?:\.\d+)?|\.\d+)\s*([A-Za-z][A-Za-z0-9-]*)?$/;
const YES = new Set(["yes", "y", "true", "1", "indoors"]);
const NO = new Set(["", "no", "n", "false", "0", "outdoors"]);
const SIZE_KEYS = ["length", "width", "depth", "volume"] as const;
type SizeKey = (typeof SIZE_KEYS)[number];

interface BedDefinition {
  row: number;
  sizes: Partial<Record<SizeKey, number>>;
  kind?: string;
  indoors?: boolean;
  existing?: CsvBed;
  /** Its first row was refused: later rows point back to it instead of repeating the problem. */
  failed?: boolean;
  /** Area for the crowding check (beds only); the plantings added so far. */
  areaM2: number | null;
  planted: { count: number; spacingM: number | null }[];
}

export function readBedsCsvRecords(
  records: string[][],
  ctx: { crops: CsvCrop[]; beds: CsvBed[] },
): BedsCsvRead {
  const out: BedsCsvRead = { problems: [], newBeds: [], plantings: [], dataRows: 0, blankRows: 0 };
  const [headerCells, ...rows] = records;
  if (!headerCells) {
    out.problems.push({
      row: 1,
      column: "(whole file)",
      message: "The file is empty: start from the template.",
    });
    return out;
  }
  const header = readHeader(headerCells.map((c) => c.replace(/^\ufeff/, "")));
  if (header.problems.length) {
    out.problems.push(...header.problems.map((p) => ({ row: 1, ...p })));
    return out;
  }
  const nonBlank = rows.filter((r) => r.some((c) => c.trim() !== "")).length;
  if (nonBlank > MAX_CSV_ROWS) {
    out.problems.push({
      row: 1,
      column: "(whole file)",
      message: `${nonBlank.toLocaleString("en-US")} rows: at most ${MAX_CSV_ROWS.toLocaleString("en-US")} at a time; split the file.`,
    });
    return out;
  }
  const existing = new Map(ctx.beds.map((b) => [b.name.trim().toLowerCase(), b]));
  const defined = new Map<string, BedDefinition>();
  rows.forEach((cells, i) => {
    const row = i + 2;
    if (cells.every((c) => c.trim() === "")) {
      out.blankRows += 1;
      return;
    }
    out.dataRows += 1;
    readRow(row, cells, header.map, ctx, existing, defined, out);
  });
  return out;
}

function readRow(
  row: number,
  cells: string[],
  map: HeaderMap,
  ctx: { crops: CsvCrop[] },
  existing: Map<string, CsvBed>,
  defined: Map<string, BedDefinition>,
  out: BedsCsvRead,
): void {
  const problems: CsvProblem[] = [];
  const problem = (key: ColumnKey, message: string) =>
    problems.push({ row, column: map.title[key], message });
  const cell = (key: ColumnKey): string | null => {
    const at = map.index[key];
    const { text, looksLikeFormula } = readCsvCell(at === undefined ? undefined : cells[at]);
    if (looksLikeFormula && !/^[+-]?\d/.test(text)) {
      problem(
        key,
        `"${text.slice(0, 40)}" starts like a spreadsheet formula; type it without the leading ${JSON.stringify(text[0])}.`,
      );
      return null;
    }
    return text;
  };
  const size = (key: SizeKey): number | undefined | null => {
    const text = cell(key);
    if (!text) return text === null ? null : undefined;
    const unit = map.unit[key]!;
    const m = NUMBER.exec(text);
    if (!m) {
      problem(key, `"${text.slice(0, 40)}" is not a number more than zero (in ${unit}).`);
      return null;
    }
    const given = m[2];
    if (given && given !== unit) {
      problem(
        key,
        isUnitName(given) && quantityOf(given) === quantityOf(unit)
          ? `"${text}" is in ${given} but this column is in ${unit}: give every value of a column in its header's unit.`
          : `"${text}" is not a number in ${unit}.`,
      );
      return null;
    }
    return Number(m[1]);
  };

  // --- the bed
  const name = cell("bed") ?? "";
  if (!name) problem("bed", "Name the bed or container.");
  const key = name.toLowerCase();
  const kind = cell("kind")?.toLowerCase() ?? "";
  const indoorsText = cell("indoors")?.toLowerCase() ?? "";
  const indoors = YES.has(indoorsText) ? true : NO.has(indoorsText) ? false : undefined;
  if (indoors === undefined) problem("indoors", `"${indoorsText}": say yes or no.`);
  const sizes: Partial<Record<SizeKey, number>> = {};
  let sizeProblem = false;
  for (const k of SIZE_KEYS) {
    const v = size(k);
    if (v === null) sizeProblem = true;
    else if (v !== undefined) sizes[k] = v;
  }
  const bedNotes = cell("bedNotes");
  const anyBedCell =
    Boolean(kind) || Object.keys(sizes).length > 0 || indoorsText !== "" || Boolean(bedNotes);
  let bed = name ? defined.get(key) : undefined;

  if (name && !bed) {
    const stored = existing.get(key);
    if (stored) {
      bed = { row, sizes: {}, existing: stored, areaM2: areaOf(stored), planted: [] };
      checkAgainstStored(
        stored,
        { kind, indoors: indoorsText ? indoors : undefined, sizes },
        map,
        problem,
      );
    } else if (!sizeProblem) {
      const input = newBedInput(name, kind, indoors ?? false, sizes, bedNotes, map, problem);
      if (input) {
        bed = {
          row,
          sizes,
          kind: input.kind,
          indoors: input.indoors,
          areaM2:
            input.kind === "bed" && input.length && input.width
              ? si(input.length) * si(input.width)
              : null,
          planted: [],
        };
        out.newBeds.push({ key, row, input });
      }
    }
    if (!bed) bed = { row, sizes: {}, areaM2: null, planted: [], failed: true };
    defined.set(key, bed);
  } else if (bed?.failed) {
    problem("bed", `Row ${bed.row} could not set up "${name}"; fix that row first.`);
  } else if (bed && anyBedCell && !bed.existing) {
    // A later row of a bed defined above: its bed cells may be blank, or must agree.
    if (kind && kind !== bed.kind)
      problem("kind", `Row ${bed.row} makes it a ${bed.kind}; rows of one bed must agree.`);
    if (indoorsText && indoors !== undefined && indoors !== bed.indoors)
      problem(
        "indoors",
        `Row ${bed.row} says ${bed.indoors ? "indoors" : "outdoors"}; rows of one bed must agree.`,
      );
    for (const k of SIZE_KEYS)
      if (sizes[k] !== undefined && sizes[k] !== bed.sizes[k])
        problem(
          k,
          `Row ${bed.row} gives ${bed.sizes[k] ?? "nothing"} here; rows of one bed must agree (or leave it blank).`,
        );
  } else if (bed?.existing && anyBedCell) {
    checkAgainstStored(
      bed.existing,
      { kind, indoors: indoorsText ? indoors : undefined, sizes },
      map,
      problem,
    );
  }

  // --- the planting (a row with no crop, plants or date is the bed alone)
  const cropName = cell("crop") ?? "";
  const plantsText = cell("plants") ?? "";
  const plantedText = cell("plantedOn") ?? "";
  const endText = cell("expectedEnd") ?? "";
  const priorityText = (cell("priority") ?? "").toLowerCase();
  const notes = cell("plantingNotes") ?? "";
  if (cropName || plantsText || plantedText || endText || priorityText || notes) {
    const crop = cropName ? matchCrop(cropName, ctx.crops) : undefined;
    if (!cropName)
      problem("crop", "Name the crop, or leave the planting columns blank for a bed alone.");
    else if (!crop)
      problem(
        "crop",
        `"${cropName}" is not on this garden's crop list: add it as a crop first, or check the spelling.`,
      );
    const count = /^\d+$/.test(plantsText) ? Number(plantsText) : NaN;
    if (!plantsText) problem("plants", "Say how many plants.");
    else if (!Number.isInteger(count) || count < 1)
      problem("plants", `"${plantsText}" is not a whole number of plants (at least 1).`);
    else if (count > MAX_PLANTS)
      problem("plants", `At most ${MAX_PLANTS.toLocaleString("en-US")} plants.`);
    const planted = isoDay("planting date").safeParse(plantedText);
    if (!planted.success)
      problem("plantedOn", `"${plantedText}": ${planted.error.issues[0]!.message} (YYYY-MM-DD)`);
    let expectedEnd: string | null = null;
    if (endText) {
      const end = isoDay("expected end").safeParse(endText);
      if (!end.success)
        problem("expectedEnd", `"${endText}": ${end.error.issues[0]!.message} (YYYY-MM-DD)`);
      else if (planted.success && end.data < planted.data)
        problem("expectedEnd", "The expected end must not be before the planting date.");
      else expectedEnd = end.data;
    }
    const priority = prioritySchema.safeParse(priorityText || "normal");
    if (!priority.success) problem("priority", `"${priorityText}": say high, normal or low.`);
    if (notes.length > 1000) problem("plantingNotes", "Use at most 1,000 characters.");
    if (bed && crop && Number.isInteger(count) && count >= 1) {
      bed.planted.push({ count, spacingM: cropFacts(crop).spacingM });
      const ratio = crowding(bed.areaM2, bed.planted);
      if (ratio !== null && ratio > CROWDED_REFUSE_RATIO)
        problem(
          "plants",
          `The plants in ${name} up to this row need about ${Math.round(ratio)} times its area at the usual spacing (common practice): check the count.`,
        );
    }
    if (!problems.length && crop && planted.success && priority.success)
      out.plantings.push({
        row,
        bedKey: key,
        bedId: bed?.existing?.id ?? null,
        cropId: crop.id,
        plantCount: count,
        plantedOn: planted.data,
        expectedEnd,
        priority: priority.data,
        notes: notes || null,
      });
  }
  out.problems.push(...problems);
}

function areaOf(b: CsvBed): number | null {
  return b.kind === "bed" && b.lengthM !== null && b.widthM !== null ? b.lengthM * b.widthM : null;
}

const BED_FIELD_COLUMN: Record<string, ColumnKey> = {
  name: "bed",
  kind: "kind",
  indoors: "indoors",
  length: "length",
  width: "width",
  depth: "depth",
  volume: "volume",
  diameter: "volume",
  notes: "bedNotes",
};

function newBedInput(
  name: string,
  kind: string,
  indoors: boolean,
  sizes: Partial<Record<SizeKey, number>>,
  notes: string | null,
  map: HeaderMap,
  problem: (key: ColumnKey, message: string) => void,
): CreateBedInput | null {
  if (kind !== "bed" && kind !== "container") {
    problem(
      "kind",
      kind
        ? `"${kind}": say bed or container.`
        : "Say bed or container (a new bed's first row gives its size).",
    );
    return null;
  }
  if (kind === "container" && sizes.volume === undefined) {
    problem("volume", "A new container needs its volume.");
    return null;
  }
  const q = (k: SizeKey) =>
    sizes[k] === undefined ? null : { value: sizes[k]!, unit: map.unit[k]! };
  const parsed = createBedSchema.safeParse({
    name,
    kind,
    indoors,
    length: q("length"),
    width: q("width"),
    depth: q("depth"),
    volume: kind === "container" ? q("volume") : null,
    notes: notes || null,
  });
  if (parsed.success) return parsed.data;
  for (const issue of parsed.error.issues) {
    const column = BED_FIELD_COLUMN[String(issue.path[0])] ?? "bed";
    problem(column, issue.message);
  }
  return null;
}

/** Rows naming a bed the garden has: bed cells may be blank, or must match what is stored (rounding aside). */
function checkAgainstStored(
  stored: CsvBed,
  given: { kind: string; indoors: boolean | undefined; sizes: Partial<Record<SizeKey, number>> },
  map: HeaderMap,
  problem: (key: ColumnKey, message: string) => void,
): void {
  const differs = `differs from the ${stored.kind} "${stored.name}" this garden already has: leave it blank to add plantings to it, or change the bed on its page first.`;
  if (given.kind && given.kind !== stored.kind) problem("kind", `"${given.kind}" ${differs}`);
  if (given.indoors !== undefined && given.indoors !== stored.indoors)
    problem("indoors", `This ${differs}`);
  const storedSi: Record<SizeKey, number | null> = {
    length: stored.lengthM,
    width: stored.widthM,
    depth: stored.depthM,
    volume: stored.containerVolumeL,
  };
  for (const k of SIZE_KEYS) {
    const v = given.sizes[k];
    if (v === undefined) continue;
    const want = storedSi[k];
    const got = toSi(v, map.unit[k] as UnitName);
    // Exports round to 3 decimals in the column's unit: anything closer than 0.5 % is the same bed.
    if (want === null || Math.abs(got - want) > 0.005 * Math.max(want, got))
      problem(k, `${v} ${map.unit[k]} ${differs}`);
  }
}
