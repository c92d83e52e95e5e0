import type { ComponentProps } from "react";

import { cn } from "@/components/ui/cn";
import { controlStyles } from "@/components/ui/control-styles";
import { ChevronDownIcon } from "@/components/ui/icons";

export type SelectProps = ComponentProps<"select">;

/**
 * The native <select>: on phones it opens the system picker, which is easier
 * to use in a garden bed than any custom list box. `className` sizes the
 * wrapper (which holds the chevron); all other props go to the <select>.
 */
export function Select({ className, children, ...props }: SelectProps) {
  return (
    <div className={cn("relative", className)}>
      <select className={cn(controlStyles, "appearance-none pr-10")} {...props}>
        {children}
      </select>
      <ChevronDownIcon className="pointer-events-none absolute top-1/2 right-3 -translate-y-1/2 text-soil-700" />
    </div>
  );
}
