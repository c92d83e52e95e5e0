import { z } from "zod";
import { GEOMETRY_LIMITS } from "@/lib/engine/supply/geometry";
import { binKinds } from "./bin";
import { isoDateSchema } from "./engine-inputs";
import { FIRST_YEAR, LAST_YEAR } from "./garden";
import { plainText } from "./text";

// The Balance's suggestions open the bin forms pre-filled through the URL
// (the URL contract between the Balance and the forms):
//   /g/{gardenId}/bins/{binId}?edit=1&trays={n}
//   /g/{gardenId}/bins/new?name=…&trays=…&startedOn=YYYY-MM-DD&worms=…&kind=…
// (the new-bin form also takes lengthM, widthM, depthM in metres). Each
// parameter is checked on its own, within the same bounds the bin schema sets;
// one that is bad or unknown is dropped, never an error: the link only fills a
// form, and nothing is saved until the grower saves it.

import type { SearchParams } from "@/lib/search-params";

export type { SearchParams };

const count = (max: number) => z.coerce.number().finite().int().min(1).max(max);
const metres = (max: number) => z.coerce.number().finite().positive().max(max);

const params = {
  name: plainText().pipe(z.string().min(1).max(60)),
  kind: z.enum(binKinds),
  trays: count(12),
  worms: count(1_000_000),
  startedOn: isoDateSchema.refine((d) => {
    const year = Number(d.slice(0, 4));
    return year >= FIRST_YEAR && year <= LAST_YEAR;
  }),
  lengthM: metres(GEOMETRY_LIMITS.traySideM),
  widthM: metres(GEOMETRY_LIMITS.traySideM),
  depthM: metres(GEOMETRY_LIMITS.trayDepthM),
};
type Param = keyof typeof params;

/** One parameter, or undefined when it is missing or fails its check. A repeated one counts once (the first). */
function read<K extends Param>(
  search: SearchParams,
  key: K,
): z.infer<(typeof params)[K]> | undefined {
  const raw = search[key];
  const value = Array.isArray(raw) ? raw[0] : raw;
  // "" would coerce to 0; a blank parameter means "not given".
  if (value === undefined || value.trim() === "") return undefined;
  const parsed = params[key].safeParse(value);
  return parsed.success ? (parsed.data as z.infer<(typeof params)[K]>) : undefined;
}

export interface NewBinPrefill {
  name?: string;
  kind?: (typeof binKinds)[number];
  trayCount?: number;
  startedOn?: string;
  startingWormCount?: number;
  trayLengthM?: number;
  trayWidthM?: number;
  trayDepthM?: number;
}

/** What /bins/new?… asks the form to start with; only the parameters that pass. */
export function newBinPrefill(search: SearchParams): NewBinPrefill {
  const out: NewBinPrefill = {
    name: read(search, "name"),
    kind: read(search, "kind"),
    trayCount: read(search, "trays"),
    startedOn: read(search, "startedOn"),
    startingWormCount: read(search, "worms"),
    trayLengthM: read(search, "lengthM"),
    trayWidthM: read(search, "widthM"),
    trayDepthM: read(search, "depthM"),
  };
  return Object.fromEntries(
    Object.entries(out).filter(([, v]) => v !== undefined),
  ) as NewBinPrefill;
}

/** /bins/{binId}?edit=1&…: does the link ask for the bin's edit form? */
export function wantsEditForm(search: SearchParams): boolean {
  return (Array.isArray(search.edit) ? search.edit[0] : search.edit) === "1";
}

/** The edit form's tray count from ?trays=n, only when it passes. */
export function editBinPrefill(search: SearchParams): { trayCount?: number } {
  const trayCount = read(search, "trays");
  return trayCount === undefined ? {} : { trayCount };
}
