"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, type DefaultValues, type FieldValues, type Path } from "react-hook-form";
import type { z } from "zod";
import { ApiError } from "@/lib/api-client";

/**
 * react-hook-form wired to the same zod schema the server uses. Server field
 * errors land on their fields; anything else becomes the form's message.
 */
export function useApiForm<S extends z.ZodType<FieldValues, FieldValues>>(
  schema: S,
  defaultValues?: DefaultValues<z.input<S>>,
) {
  const form = useForm<z.input<S>, unknown, z.output<S>>({
    resolver: zodResolver(schema as never) as never,
    defaultValues,
    mode: "onTouched",
  });
  const [formError, setFormError] = useState<string | null>(null);

  function submit(action: (values: z.output<S>) => Promise<void>) {
    return form.handleSubmit(async (values) => {
      setFormError(null);
      try {
        await action(values);
      } catch (error) {
        if (error instanceof ApiError) {
          let placed = false;
          for (const [name, message] of Object.entries(error.fields ?? {})) {
            // "rules.1.recurrence" lands on the second rule's field: its first segment is the form's.
            if (name.split(".")[0]! in (form.getValues() as object)) {
              form.setError(name as Path<z.input<S>>, { message });
              placed = true;
            }
          }
          if (!placed || !error.code.startsWith("validation")) setFormError(error.message);
        } else {
          setFormError("Something went wrong. Please try again.");
        }
      }
    });
  }

  return { form, formError, setFormError, submit };
}
