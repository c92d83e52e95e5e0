import type { GardenNames } from "@/components/balance/garden-names";
import type { GapSuggestion } from "@/lib/engine";

// A gap suggestion as links to the form that makes it real, pre-filled and not saved,
// by the URL contract the bed and bin pages read (RULES.md, "URL contract"):
//   rate cut    /g/{g}/beds/{bedId}?planting={plantingId}&cut={percent}
//   extra trays /g/{g}/bins/{binId}?edit=1&trays={newTrayCount}
//   a new bin   /g/{g}/bins/new?name=…&trays=…&startedOn=YYYY-MM-DD&worms=…&kind=…
// Buying castings changes nothing in the garden, so it has no form.

export interface SuggestionLink {
  label: string;
  href: string;
}

export function formLinksForSuggestion(
  s: GapSuggestion,
  names: GardenNames,
  gardenId: string,
): SuggestionLink[] {
  const base = `/g/${encodeURIComponent(gardenId)}`;
  const like = s.explanation.inputs.like;
  const likeBin = like && "ref" in like ? names.bins.find((b) => b.id === like.id) : undefined;
  switch (s.kind) {
    case "rate-cut": {
      if (!s.cutPct || s.cutPct >= 100 || !s.plantingIds) return [];
      // Rounded up: the engine checked this cut, and a deeper one closes at least as much.
      const cut = Math.min(99, Math.ceil(s.cutPct));
      return s.plantingIds.flatMap((id) => {
        const planting = names.plantings.find((p) => p.id === id);
        if (!planting) return [];
        const query = new URLSearchParams({ planting: id, cut: String(cut) });
        return [
          {
            label: `Edit ${planting.label}: ${cut} % less`,
            href: `${base}/beds/${encodeURIComponent(planting.bedId)}?${query}`,
          },
        ];
      });
    }
    case "extra-trays": {
      if (!likeBin || !s.trays) return [];
      const trays = likeBin.trays + s.trays;
      const query = new URLSearchParams({ edit: "1", trays: String(trays) });
      return [
        {
          label: `Edit ${likeBin.name}: ${trays} trays`,
          href: `${base}/bins/${encodeURIComponent(likeBin.id)}?${query}`,
        },
      ];
    }
    case "second-bin":
      if (!likeBin || !s.startDate) return [];
      return [
        newBinLink(base, "Add the second bin", {
          name: `${likeBin.name} 2`.slice(0, 60),
          trays: likeBin.trays,
          startedOn: s.startDate,
          worms: likeBin.startingWorms,
          kind: likeBin.kind ?? "stacked-tray",
        }),
      ];
    case "start-bin":
      if (!s.startDate || !s.traysInStack || !s.worms) return [];
      return [
        newBinLink(base, "Add this bin", {
          name: "Worm bin",
          trays: s.traysInStack,
          startedOn: s.startDate,
          worms: s.worms,
          kind: "stacked-tray",
        }),
      ];
    default:
      return [];
  }
}

function newBinLink(
  base: string,
  label: string,
  fields: { name: string; trays: number; startedOn: string; worms: number; kind: string },
): SuggestionLink {
  const query = new URLSearchParams({
    name: fields.name,
    trays: String(fields.trays),
    startedOn: fields.startedOn,
    worms: String(Math.round(fields.worms)),
    kind: fields.kind,
  });
  return { label, href: `${base}/bins/new?${query}` };
}
