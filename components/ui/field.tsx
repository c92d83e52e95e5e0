import { cloneElement, isValidElement, useId, type ReactElement, type ReactNode } from "react";

import { cn } from "@/components/ui/cn";

/** What a field hands to its control so label, hint and error are announced with it. */
export type FieldControlProps = {
  id: string;
  "aria-describedby"?: string;
  "aria-invalid"?: true;
};

type ControlElement = ReactElement<{ id?: string; "aria-describedby"?: string }>;

export type FieldProps = {
  label: ReactNode;
  hint?: ReactNode;
  /** The message to show; a field with an error is marked aria-invalid. */
  error?: ReactNode;
  /** Shows "(required)" after the label; the control still needs its own `required`. */
  required?: boolean;
  /** Overrides the generated id (kept if the child control already has one). */
  id?: string;
  className?: string;
  /**
   * Either one control element (Input, Select, Textarea, with `{...register("x")}`
   * spread on it), or a function that receives the wiring props to spread.
   */
  children: ControlElement | ((control: FieldControlProps) => ReactNode);
};

export function Field({ label, hint, error, required, id, className, children }: FieldProps) {
  const generated = useId();
  const childId = isValidElement(children) ? children.props.id : undefined;
  const controlId = childId ?? id ?? `field-${generated}`;
  const hintId = hint ? `${controlId}-hint` : undefined;
  const errorId = error ? `${controlId}-error` : undefined;
  const inherited = isValidElement(children) ? children.props["aria-describedby"] : undefined;
  const describedBy = [inherited, hintId, errorId].filter(Boolean).join(" ") || undefined;

  const control: FieldControlProps = {
    id: controlId,
    ...(describedBy ? { "aria-describedby": describedBy } : {}),
    ...(error ? { "aria-invalid": true as const } : {}),
  };

  return (
    <div className={cn("flex flex-col gap-1.5", className)}>
      <label htmlFor={controlId} className="font-semibold text-soil-900">
        {label}
        {required ? (
          <span className="ml-1 text-sm font-normal text-soil-700">(required)</span>
        ) : null}
      </label>
      {hint ? (
        <p id={hintId} className="text-sm text-soil-700">
          {hint}
        </p>
      ) : null}
      {typeof children === "function" ? children(control) : cloneElement(children, control)}
      {error ? (
        <p id={errorId} className="text-sm font-semibold text-bloom-700">
          {error}
        </p>
      ) : null}
    </div>
  );
}
