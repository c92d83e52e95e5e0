import { useId, type ComponentProps, type ReactNode } from "react";

import { cn } from "@/components/ui/cn";

export type TableProps = ComponentProps<"table"> & {
  /** Names the table for screen readers and labels its scroll region. */
  caption?: ReactNode;
  /** Keep the caption for assistive tech but do not show it (the page heading says it). */
  hideCaption?: boolean;
  wrapperClassName?: string;
};

/**
 * A 12-month balance does not fit a 375 px phone, so the table scrolls sideways
 * inside its own region instead of pushing the page wider. The region is
 * focusable and named so keyboard users can scroll it too (WCAG 2.1.1).
 */
export function Table({
  caption,
  hideCaption,
  wrapperClassName,
  className,
  children,
  ...props
}: TableProps) {
  const captionId = `table-caption-${useId()}`;
  return (
    <div
      role="region"
      aria-labelledby={caption ? captionId : undefined}
      tabIndex={0}
      className={cn(
        "max-w-full overflow-x-auto rounded-card border border-loam-200 bg-white",
        wrapperClassName,
      )}
    >
      <table
        className={cn("w-full border-collapse text-left text-sm sm:text-base", className)}
        {...props}
      >
        {caption ? (
          <caption
            id={captionId}
            className={cn(
              hideCaption ? "sr-only" : "px-4 py-3 text-left font-display text-lg font-semibold",
            )}
          >
            {caption}
          </caption>
        ) : null}
        {children}
      </table>
    </div>
  );
}

export function THead({ className, ...props }: ComponentProps<"thead">) {
  return <thead className={cn("bg-loam-100", className)} {...props} />;
}

export function TBody({ className, ...props }: ComponentProps<"tbody">) {
  return <tbody className={cn("divide-y divide-loam-200", className)} {...props} />;
}

export function Tr({ className, ...props }: ComponentProps<"tr">) {
  return <tr className={cn("align-top", className)} {...props} />;
}

type CellAlign = { numeric?: boolean };

export function Th({
  scope = "col",
  numeric,
  className,
  ...props
}: ComponentProps<"th"> & CellAlign) {
  return (
    <th
      scope={scope}
      className={cn(
        "px-3 py-2 font-semibold whitespace-nowrap text-soil-900",
        numeric && "text-right",
        className,
      )}
      {...props}
    />
  );
}

/** `numeric` right-aligns figures so amounts compare down a column. */
export function Td({ numeric, className, ...props }: ComponentProps<"td"> & CellAlign) {
  return (
    <td
      className={cn(
        "px-3 py-2 text-soil-900",
        numeric && "text-right whitespace-nowrap",
        className,
      )}
      {...props}
    />
  );
}
