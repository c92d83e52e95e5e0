"use client";

import { useRouter } from "next/navigation";
import { cn, Select } from "@/components/ui";

type GardenOption = { id: string; name: string };

/** Jumps between the gardens a person belongs to (their plot, a community garden…). */
export function GardenSwitcher({
  gardens,
  currentId,
  className,
}: {
  gardens: GardenOption[];
  currentId?: string;
  className?: string;
}) {
  const router = useRouter();
  if (gardens.length === 0) return null;
  return (
    <label className={cn("flex items-center", className)}>
      <span className="sr-only">Garden</span>
      <Select
        value={currentId ?? ""}
        onChange={(e) => router.push(e.target.value ? `/g/${e.target.value}` : "/gardens")}
        className="w-full min-w-0"
        aria-label="Switch garden"
      >
        {!currentId ? <option value="">Choose a garden…</option> : null}
        {gardens.map((g) => (
          <option key={g.id} value={g.id}>
            {g.name}
          </option>
        ))}
        <option value="">All gardens…</option>
      </Select>
    </label>
  );
}
