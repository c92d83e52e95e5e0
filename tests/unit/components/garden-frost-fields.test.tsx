import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useEffect } from "react";
import { useForm } from "react-hook-form";
import { describe, expect, it } from "vitest";
import { GardenFields } from "@/components/garden/garden-fields";
import type { CreateGardenInput } from "@/lib/validation/garden";

// Frost dates are entered as a month and a day: no year to choose, since the
// plan applies them to every year. Days per month from the Gregorian calendar
// (April 30, February 29 in a leap year).

// The test reads the form's values through this, set once the harness mounts.
const form = { read: (): CreateGardenInput => ({}) as CreateGardenInput };
function Harness() {
  const methods = useForm<CreateGardenInput>({
    defaultValues: {
      name: "",
      timeZone: "UTC",
      unitSystem: "us",
      lastSpringFrost: "04-15",
      firstFallFrost: "10-15",
    },
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

describe("GardenFields frost days", () => {
  it("asks for a month and a day, never a year", async () => {
    render(<Harness />);
    const spring = screen.getByRole("group", { name: "Last spring frost" });
    expect(within(spring).queryByLabelText(/year/i)).toBeNull();
    expect(spring.querySelector('input[type="date"]')).toBeNull();
    await userEvent.selectOptions(within(spring).getByLabelText("Month"), "May");
    await userEvent.selectOptions(within(spring).getByLabelText("Day"), "2");
    expect(form.read().lastSpringFrost).toBe("05-02");
  });

  it("offers only the days the month has, keeping 29 February", async () => {
    render(<Harness />);
    const fall = screen.getByRole("group", { name: "First fall frost" });
    const day = within(fall).getByLabelText("Day");
    await userEvent.selectOptions(within(fall).getByLabelText("Month"), "February");
    expect(within(day).getAllByRole("option")).toHaveLength(29);
    await userEvent.selectOptions(within(fall).getByLabelText("Month"), "April");
    expect(within(day).getAllByRole("option")).toHaveLength(30);
    expect(form.read().firstFallFrost).toBe("04-15");
  });
});
