"use client";

import { useQuery } from "@tanstack/react-query";
import Image from "next/image";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useState } from "react";
import { Badge, Button, Select, Skeleton } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import { formatDay } from "@/lib/format";
import { formatAmount, formatTemperature } from "@/lib/format-quantity";
import { queryKeys } from "@/lib/query-keys";
import type { UnitSystem } from "@/lib/units";
import { binEventKindLabels, type BinEventKind } from "@/lib/validation/bin-event";

// The bin's timeline, newest first; the filter lives in the URL (?kind=…) so a
// filtered view can be linked. A page shows a screenful at a time: on a phone a
// hundred entries would push everything below them out of reach.

const ENTRIES_PER_STEP = 15;

export interface LogEntry {
  id: string;
  kind: BinEventKind;
  on: string;
  foodKg: number | null;
  foods: string[];
  castingsL: number | null;
  castingsKg: number | null;
  liquidL: number | null;
  temperatureC: number | null;
  moisturePercent: number | null;
  wormCount: number | null;
  direction: "in" | "out" | null;
  otherBin: { gardenName: string; binName: string } | null;
  note: string | null;
  photoIds: string[];
  loggedBy: string | null;
  loggedAt: string;
}

function summary(e: LogEntry, system: UnitSystem): string {
  const parts: string[] = [];
  if (e.foodKg !== null) parts.push(formatAmount(e.foodKg, "castings-mass", system));
  if (e.foods.length) parts.push(e.foods.join(", "));
  if (e.castingsKg !== null)
    parts.push(`${formatAmount(e.castingsKg, "castings-mass", system)} castings`);
  if (e.castingsL !== null)
    parts.push(`(${formatAmount(e.castingsL, "liquid", system)} by volume)`);
  if (e.liquidL !== null) parts.push(formatAmount(e.liquidL, "liquid", system));
  if (e.temperatureC !== null) parts.push(formatTemperature(e.temperatureC, system));
  if (e.moisturePercent !== null) parts.push(`${Math.round(e.moisturePercent)} % moisture`);
  if (e.wormCount !== null) {
    const n = e.wormCount.toLocaleString("en-US");
    if (e.direction === "out")
      parts.push(`${n} worms out${e.otherBin ? ` to ${e.otherBin.binName}` : ""}`);
    else if (e.direction === "in")
      parts.push(`${n} worms in${e.otherBin ? ` from ${e.otherBin.binName}` : ""}`);
    else parts.push(`${n} worms counted`);
  }
  return parts.join(" · ");
}

export function BinLog({
  gardenId,
  binId,
  system,
}: {
  gardenId: string;
  binId: string;
  system: UnitSystem;
}) {
  const router = useRouter();
  const pathname = usePathname();
  const search = useSearchParams();
  const kind = (search.get("kind") ?? undefined) as BinEventKind | undefined;
  const [shown, setShown] = useState(ENTRIES_PER_STEP);
  const { data, isPending, isError } = useQuery({
    queryKey: queryKeys.binLog(gardenId, binId, kind),
    queryFn: () =>
      apiFetch<{ entries: LogEntry[] }>(
        `/api/gardens/${gardenId}/bins/${binId}/events${kind ? `?kind=${kind}` : ""}`,
      ),
  });
  return (
    <div className="flex flex-col gap-3">
      <label className="flex max-w-xs flex-col gap-1.5 font-semibold">
        Show
        <Select
          value={kind ?? ""}
          onChange={(e) => {
            const next = new URLSearchParams(search);
            if (e.target.value) next.set("kind", e.target.value);
            else next.delete("kind");
            router.replace(`${pathname}${next.size ? `?${next}` : ""}`, { scroll: false });
          }}
        >
          <option value="">Everything</option>
          {Object.entries(binEventKindLabels).map(([k, label]) => (
            <option key={k} value={k}>
              {label}
            </option>
          ))}
        </Select>
      </label>
      {isPending ? <Skeleton className="h-24" /> : null}
      {isError ? <p>The log could not be loaded. Reload the page to try again.</p> : null}
      {data && data.entries.length === 0 ? (
        <p className="text-soil-700">Nothing logged{kind ? " of this kind" : ""} yet.</p>
      ) : null}
      <ol className="flex flex-col divide-y divide-loam-200">
        {data?.entries.slice(0, shown).map((e) => (
          <li key={e.id} className="flex flex-col gap-0.5 py-2">
            <div className="flex flex-wrap items-center gap-2">
              <span className="font-semibold">{formatDay(e.on)}</span>
              <Badge>{binEventKindLabels[e.kind]}</Badge>
              <span>{summary(e, system)}</span>
            </div>
            {e.note ? <p className="text-soil-700">{e.note}</p> : null}
            {e.photoIds.length ? (
              <div className="flex flex-wrap gap-2 py-1">
                {e.photoIds.map((id, i) => {
                  const src = `/api/gardens/${gardenId}/photos/${id}`;
                  return (
                    <a key={id} href={src} target="_blank" rel="noopener" className="block">
                      {/* Served by our own route to members only: nothing for the optimizer to fetch. */}
                      <Image
                        unoptimized
                        src={src}
                        width={96}
                        height={72}
                        alt={`Photo ${i + 1} of the ${binEventKindLabels[e.kind].toLowerCase()} on ${formatDay(e.on)}`}
                        className="h-18 w-24 rounded-card border border-loam-200 object-cover"
                      />
                    </a>
                  );
                })}
              </div>
            ) : null}
            {e.loggedBy ? <p className="text-sm text-soil-600">Logged by {e.loggedBy}</p> : null}
          </li>
        ))}
      </ol>
      {data && data.entries.length > shown ? (
        <Button
          variant="secondary"
          className="self-start"
          onClick={() => setShown((n) => n + ENTRIES_PER_STEP)}
        >
          Show {Math.min(ENTRIES_PER_STEP, data.entries.length - shown)} more of{" "}
          {data.entries.length - shown} older
        </Button>
      ) : null}
      {data?.entries.slice(0, shown).some((e) => !e.loggedBy) ? (
        <p className="text-sm text-soil-600">
          Entries with no name beside them came from an imported file or from someone who is no
          longer a member.
        </p>
      ) : null}
    </div>
  );
}
