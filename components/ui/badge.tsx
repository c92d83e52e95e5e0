import type { ComponentProps } from "react";

import { cn } from "@/components/ui/cn";

export type BadgeTone = "neutral" | "positive" | "caution" | "info" | "danger";

// Each pair is dark text on a pale tint, ≥ 7:1 (checked in ui-palette.test.tsx).
const tones: Record<BadgeTone, string> = {
  neutral: "bg-loam-100 text-soil-900 border-loam-200",
  positive: "bg-leaf-100 text-leaf-900 border-leaf-100",
  caution: "bg-clay-50 text-clay-800 border-clay-200",
  info: "bg-frost-50 text-frost-800 border-frost-200",
  danger: "bg-bloom-50 text-bloom-800 border-bloom-200",
};

export type BadgeProps = ComponentProps<"span"> & { tone?: BadgeTone };

/** A short label such as a member's role ("grower") or a state ("due", "short"). */
export function Badge({ tone = "neutral", className, ...props }: BadgeProps) {
  return (
    <span
      className={cn(
        "inline-flex items-center rounded-pill border px-2.5 py-0.5 text-sm font-semibold whitespace-nowrap",
        tones[tone],
        className,
      )}
      {...props}
    />
  );
}
