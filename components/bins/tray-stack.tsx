import { cn } from "@/components/ui";
import { formatDay } from "@/lib/format";
import type { TrayView } from "./tray-states";

// The stack drawn as boxes, top tray first: our own simple picture, with
// words on every tray so colour is never the only signal.

const look: Record<TrayView["state"], { label: string; box: string }> = {
  filling: { label: "Filling", box: "border-leaf-700 bg-leaf-100" },
  processing: { label: "Processing", box: "border-soil-700 bg-loam-200" },
  ready: { label: "Ready to harvest", box: "border-soil-900 bg-soil-700 text-loam-50" },
  empty: { label: "Not in use yet", box: "border-dashed border-loam-400 bg-loam-50 text-soil-700" },
};

export function TrayStack({ trays }: { trays: TrayView[] }) {
  return (
    <ol aria-label="Trays, top first" className="flex max-w-md flex-col gap-1.5">
      {trays.map((t) => (
        <li
          key={t.position}
          className={cn(
            "flex min-h-14 flex-wrap items-center justify-between gap-x-3 rounded-md border-2 px-3 py-2",
            look[t.state].box,
          )}
        >
          <span className="font-semibold">
            Tray {t.position}: {look[t.state].label}
          </span>
          <span className="text-sm">
            {t.addedOn ? `on since ${formatDay(t.addedOn)}` : ""}
            {t.readyOn && t.state !== "filling" && t.state !== "ready"
              ? ` · ready about ${formatDay(t.readyOn)}`
              : ""}
          </span>
        </li>
      ))}
      <li
        aria-hidden
        className="h-3 rounded-b-lg border-2 border-t-0 border-soil-700 bg-loam-400"
      />
      <li className="text-sm text-soil-700">Base: collects the liquid (leachate)</li>
    </ol>
  );
}
