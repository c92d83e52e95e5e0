import type { ComponentProps } from "react";

import { cn } from "@/components/ui/cn";
import { controlStyles } from "@/components/ui/control-styles";

export type TextareaProps = ComponentProps<"textarea">;

export function Textarea({ className, rows = 4, ...props }: TextareaProps) {
  return <textarea rows={rows} className={cn(controlStyles, "resize-y", className)} {...props} />;
}
