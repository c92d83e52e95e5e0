import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useEffect } from "react";
import { useForm } from "react-hook-form";
import { describe, expect, it } from "vitest";
import { GardenFields } from "@/components/garden/garden-fields";
import type { CreateGardenInput } from "@/lib/validation/garden";

// The time zone field offers every zone of the runtime (ECMA-402
// Intl.supportedValuesOf) and "UTC", and takes a typed name from the keyboard.

// The test reads the form's values through this, set once the harness mounts.
const form = { read: (): CreateGardenInput => ({}) as CreateGardenInput };
function Harness() {
  const methods = useForm<CreateGardenInput>({
    defaultValues: { name: "", timeZone: "UTC", unitSystem: "us", lastSpringFrost: "04-15" },
  });
  useEffect(() => {
    form.read = methods.getValues;
  }, [methods]);
  return (
    <GardenFields
      register={methods.register}
      control={methods.control}
      errors={methods.formState.errors}
    />
  );
}

describe("GardenFields time zone", () => {
  it("offers every zone the runtime knows, not a short list", () => {
    render(<Harness />);
    const input = screen.getByRole("combobox", { name: "Time zone" });
    const list = input.getAttribute("list");
    expect(list).toBeTruthy();
    const offered = [...document.querySelectorAll(`datalist#${list} option`)].map(
      (o) => (o as HTMLOptionElement).value,
    );
    expect(offered.length).toBe(Intl.supportedValuesOf("timeZone").length + 1);
    // Zones from the IANA tz database (zone1970.tab; from memory) beyond the old 14.
    expect(offered).toEqual(expect.arrayContaining(["Pacific/Chatham", "Africa/Nairobi", "UTC"]));
  });

  it("takes a zone typed on the keyboard", async () => {
    render(<Harness />);
    const input = screen.getByRole("combobox", { name: "Time zone" });
    await userEvent.clear(input);
    await userEvent.type(input, "Pacific/Chatham");
    expect(form.read().timeZone).toBe("Pacific/Chatham");
  });
});
