import type { ComponentProps } from "react";

import { cn } from "@/components/ui/cn";

/**
 * A placeholder block while data loads. Hidden from assistive tech: the
 * surrounding loading.tsx should say "Loading…" once, in words. The pulse stops
 * for people who ask for reduced motion.
 */
export function Skeleton({ className, ...props }: ComponentProps<"div">) {
  return (
    <div
      aria-hidden="true"
      className={cn(
        "h-4 w-full animate-pulse rounded-control bg-loam-200 motion-reduce:animate-none",
        className,
      )}
      {...props}
    />
  );
}
