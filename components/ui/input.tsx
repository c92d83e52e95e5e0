import type { ComponentProps } from "react";

import { cn } from "@/components/ui/cn";
import { controlStyles } from "@/components/ui/control-styles";

export type InputProps = ComponentProps<"input">;

/** A text-like input; `ref` is a plain prop in React 19, so `register()` can be spread. */
export function Input({ className, type = "text", ...props }: InputProps) {
  return <input type={type} className={cn(controlStyles, className)} {...props} />;
}
