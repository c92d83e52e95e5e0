import type { ComponentProps } from "react";

import { cn } from "@/components/ui/cn";
import { SpinnerIcon } from "@/components/ui/icons";

export type ButtonVariant = "primary" | "secondary" | "ghost" | "danger";
export type ButtonSize = "sm" | "md" | "lg";

const variants: Record<ButtonVariant, string> = {
  primary: "bg-leaf-700 text-white hover:bg-leaf-800 active:bg-leaf-900",
  secondary: "border border-loam-400 bg-white text-soil-900 hover:bg-loam-100 active:bg-loam-200",
  ghost: "text-leaf-800 hover:bg-leaf-50 active:bg-leaf-100",
  danger: "bg-bloom-700 text-white hover:bg-bloom-800 active:bg-bloom-800",
};

// Every size keeps at least a 44 px tap target (WCAG 2.5.5 AAA; 2.5.8 asks 24 px).
const sizes: Record<ButtonSize, string> = {
  sm: "min-h-11 px-3 text-sm",
  md: "min-h-11 px-4 text-base",
  lg: "min-h-12 px-6 text-lg",
};

/** Class names for anything that should look like a button (e.g. a next/link). */
export function buttonStyles({
  variant = "primary",
  size = "md",
  className,
}: { variant?: ButtonVariant; size?: ButtonSize; className?: string } = {}): string {
  return cn(
    "inline-flex min-w-11 items-center justify-center gap-2 rounded-control font-semibold",
    "transition-colors select-none disabled:cursor-not-allowed disabled:opacity-60",
    variants[variant],
    sizes[size],
    className,
  );
}

export type ButtonProps = ComponentProps<"button"> & {
  variant?: ButtonVariant;
  size?: ButtonSize;
  /** Work is in flight: shows a spinner, sets aria-busy and blocks repeat presses. */
  pending?: boolean;
};

export function Button({
  variant = "primary",
  size = "md",
  pending = false,
  disabled,
  type = "button",
  className,
  children,
  ...props
}: ButtonProps) {
  return (
    <button
      // A plain "button" by default so a stray button in a form never submits it.
      type={type}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      className={buttonStyles({ variant, size, className })}
      {...props}
    >
      {pending ? <SpinnerIcon className="size-4" /> : null}
      {children}
    </button>
  );
}
