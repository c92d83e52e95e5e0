import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useForm } from "react-hook-form";
import { describe, expect, it } from "vitest";

import { Field, Input, Select } from "@/components/ui";

// Accessible-name and description wiring follow the HTML Living Standard (<label for>)
// and WAI-ARIA 1.2 (aria-describedby, aria-invalid); the names are computed by
// dom-accessibility-api, which implements W3C "Accessible Name and Description Computation 1.2".

describe("Field", () => {
  it("names the control by its label and describes it by the hint", () => {
    render(
      <Field label="Bed name" hint="As you call it in the garden, e.g. North bed">
        <Input />
      </Field>,
    );
    const input = screen.getByRole("textbox", { name: "Bed name" });
    expect(input).toHaveAccessibleDescription("As you call it in the garden, e.g. North bed");
    expect(input).not.toHaveAttribute("aria-invalid");
  });

  it("adds the error to the description and marks the control invalid", () => {
    render(
      <Field label="Length" hint="Inside length in feet" error="Length must be more than 0 ft">
        <Input inputMode="decimal" />
      </Field>,
    );
    const input = screen.getByRole("textbox", { name: "Length" });
    expect(input).toHaveAttribute("aria-invalid", "true");
    expect(input).toHaveAccessibleDescription(
      "Inside length in feet Length must be more than 0 ft",
    );
    const ids = input.getAttribute("aria-describedby")?.split(" ") ?? [];
    expect(ids).toHaveLength(2);
    expect(document.getElementById(ids[1] ?? "")).toHaveTextContent(
      "Length must be more than 0 ft",
    );
  });

  it("keeps an id the control already has and supports the render-prop form", () => {
    render(
      <>
        <Field label="Material">
          <Select id="material">
            <option>castings</option>
            <option>leachate</option>
          </Select>
        </Field>
        <Field label="Note" error="Too long">
          {(control) => <textarea {...control} />}
        </Field>
      </>,
    );
    expect(screen.getByRole("combobox", { name: "Material" })).toHaveAttribute("id", "material");
    expect(screen.getByRole("textbox", { name: "Note" })).toHaveAccessibleDescription("Too long");
  });

  it("works with a react-hook-form register() spread, ref included", async () => {
    function BedForm() {
      const {
        register,
        handleSubmit,
        formState: { errors },
      } = useForm<{ name: string }>();
      return (
        <form onSubmit={handleSubmit(() => undefined)}>
          <Field label="Bed name" error={errors.name?.message}>
            <Input {...register("name", { required: "Give the bed a name" })} />
          </Field>
          <button type="submit">Save</button>
        </form>
      );
    }
    const user = userEvent.setup();
    render(<BedForm />);
    await user.click(screen.getByRole("button", { name: "Save" }));
    const input = await screen.findByRole("textbox", { name: "Bed name" });
    expect(input).toHaveAccessibleDescription("Give the bed a name");
    expect(input).toHaveAttribute("aria-invalid", "true");
    // react-hook-form focuses the first invalid field through the ref it registered.
    expect(input).toHaveFocus();

    await user.type(input, "Hollis North");
    await user.click(screen.getByRole("button", { name: "Save" }));
    expect(input).not.toHaveAttribute("aria-invalid");
    expect(input).not.toHaveAccessibleDescription();
  });
});
