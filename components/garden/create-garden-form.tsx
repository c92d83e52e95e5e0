"use client";

import { useRouter } from "next/navigation";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import { localTimeZone } from "@/lib/time-zones";
import { createGardenSchema } from "@/lib/validation/garden";
import { GardenFields } from "./garden-fields";

export function CreateGardenForm() {
  const router = useRouter();
  const { form, formError, submit } = useApiForm(createGardenSchema, {
    name: "",
    timeZone: localTimeZone(),
    unitSystem: "us",
    lastSpringFrost: "04-15",
    firstFallFrost: "10-15",
    location: "",
  });

  const onSubmit = submit(async (values) => {
    const { garden } = await apiFetch<{ garden: { id: string } }>("/api/gardens", { body: values });
    router.push(`/g/${garden.id}`);
    router.refresh();
  });

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="flex flex-col gap-4"
      aria-label="Start a garden"
    >
      <FormMessage message={formError} />
      <GardenFields
        register={form.register}
        control={form.control}
        errors={form.formState.errors}
      />
      <Button type="submit" pending={form.formState.isSubmitting}>
        Start this garden
      </Button>
    </form>
  );
}
