import type { ReactNode } from "react";

import { cn } from "@/components/ui/cn";

export type EmptyStateProps = {
  /** A decorative icon; hidden from screen readers because the title says it all. */
  icon?: ReactNode;
  title: ReactNode;
  text?: ReactNode;
  /** Usually the one button or link that fills the gap ("Add a bed"). */
  action?: ReactNode;
  as?: "h2" | "h3";
  className?: string;
};

export function EmptyState({
  icon,
  title,
  text,
  action,
  as: Heading = "h2",
  className,
}: EmptyStateProps) {
  return (
    <div
      className={cn(
        "flex flex-col items-center gap-3 rounded-card border border-dashed border-loam-400 bg-loam-100 px-4 py-10 text-center",
        className,
      )}
    >
      {icon ? (
        <div aria-hidden="true" className="text-leaf-700 [&_svg]:size-10">
          {icon}
        </div>
      ) : null}
      <Heading className="font-display text-xl font-semibold text-soil-900">{title}</Heading>
      {text ? <p className="max-w-prose text-soil-700">{text}</p> : null}
      {action ? <div className="mt-2">{action}</div> : null}
    </div>
  );
}
