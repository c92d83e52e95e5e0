"use client";

import { useRouter } from "next/navigation";
import { FormMessage } from "@/components/forms/form-message";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button, useToast } from "@/components/ui";
import { apiFetch } from "@/lib/api-client";
import { createGardenSchema, type CreateGardenInput } from "@/lib/validation/garden";
import { GardenFields } from "./garden-fields";

export function GardenSettingsForm({
  gardenId,
  initial,
}: {
  gardenId: string;
  initial: CreateGardenInput;
}) {
  const router = useRouter();
  const toast = useToast();
  const { form, formError, submit } = useApiForm(createGardenSchema, initial);

  const onSubmit = submit(async (values) => {
    await apiFetch(`/api/gardens/${gardenId}`, { method: "PATCH", body: values });
    toast.show({ title: "Settings saved.", tone: "positive" });
    form.reset(values);
    router.refresh();
  });

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="flex flex-col gap-4"
      aria-label="Garden settings"
    >
      <FormMessage message={formError} />
      <GardenFields
        register={form.register}
        control={form.control}
        errors={form.formState.errors}
      />
      <Button
        type="submit"
        pending={form.formState.isSubmitting}
        disabled={!form.formState.isDirty}
      >
        Save settings
      </Button>
    </form>
  );
}
