import type { ComponentProps } from "react";

import { cn } from "@/components/ui/cn";

export type CardProps = ComponentProps<"section">;

/** A bordered surface; a <section>, so give it an aria-labelledby when it has a title. */
export function Card({ className, ...props }: CardProps) {
  return (
    <section
      className={cn("rounded-card border border-loam-200 bg-white shadow-sm", className)}
      {...props}
    />
  );
}

export function CardHeader({ className, ...props }: ComponentProps<"div">) {
  return (
    <div
      className={cn(
        "flex flex-wrap items-start justify-between gap-3 border-b border-loam-200 px-4 py-3 sm:px-6",
        className,
      )}
      {...props}
    />
  );
}

export type CardTitleProps = ComponentProps<"h2"> & {
  /** Heading level that fits the page outline; h2 by default. */
  as?: "h2" | "h3" | "h4";
};

export function CardTitle({ as: Heading = "h2", className, ...props }: CardTitleProps) {
  return (
    <Heading
      className={cn("font-display text-xl font-semibold text-soil-900", className)}
      {...props}
    />
  );
}

export function CardBody({ className, ...props }: ComponentProps<"div">) {
  return <div className={cn("px-4 py-4 sm:px-6", className)} {...props} />;
}
