import { z } from "zod";
import { quantityOf, siUnit, toSi, unitNames, type Quantity, type UnitName } from "@/lib/units";

// A measured value as a grower types it: { "value": 24, "unit": "in" }. The
// unit must be one we know and of the right kind; the value must be positive,
// finite and below a bound that catches typing slips (in SI, shown in the message).

export const unitSchema = z.enum(unitNames, {
  error: (issue) =>
    `unknown unit ${JSON.stringify(issue.input)}; use one of ${unitNames.join(", ")}`,
});

export interface QuantityValue {
  value: number;
  unit: UnitName;
}

/** `sign`: "positive" (default), "nonnegative", or "nonzero" (a change either way; the bound is on its size). */
export function quantitySchema(
  kinds: Quantity | Quantity[],
  maxSi?: number,
  allowZero = false,
  sign: "unsigned" | "nonzero" = "unsigned",
) {
  const allowed = Array.isArray(kinds) ? kinds : [kinds];
  const value =
    sign === "nonzero"
      ? z
          .number()
          .finite()
          .refine((v) => v !== 0, "must not be zero")
      : allowZero
        ? z.number().finite().nonnegative()
        : z.number().finite().positive();
  return z
    .object({
      value,
      unit: unitSchema,
    })
    .strict()
    .superRefine((q, ctx) => {
      const kind = quantityOf(q.unit);
      if (!allowed.includes(kind)) {
        ctx.addIssue({
          code: "custom",
          path: ["unit"],
          message: `"${q.unit}" is a ${kind} unit; expected a ${allowed.join(" or ")} unit`,
        });
        return;
      }
      if (maxSi !== undefined && Math.abs(toSi(q.value, q.unit)) > maxSi) {
        ctx.addIssue({
          code: "custom",
          path: ["value"],
          message: `${q.value} ${q.unit} is larger than we accept (at most ${maxSi} ${siUnit[kind]})`,
        });
      }
    });
}

/** SI value of a checked quantity (L, kg, m², m). */
export function si(q: QuantityValue): number {
  return toSi(q.value, q.unit);
}

/**
 * A quantity per another, as a grower types it: { "value": 2, "unit": "lb", "per": "ft2" }.
 * The bound is on the SI ratio (e.g. kg per m²).
 */
export function ratioSchema(kind: Quantity, perKind: Quantity, maxSi: number) {
  return z
    .object({ value: z.number().finite().positive(), unit: unitSchema, per: unitSchema })
    .strict()
    .superRefine((q, ctx) => {
      for (const [key, want] of [
        ["unit", kind],
        ["per", perKind],
      ] as const) {
        const got = quantityOf(q[key]);
        if (got !== want)
          ctx.addIssue({
            code: "custom",
            path: [key],
            message: `"${q[key]}" is a ${got} unit; expected a ${want} unit`,
          });
      }
    })
    .refine(
      (q) =>
        quantityOf(q.unit) !== kind ||
        quantityOf(q.per) !== perKind ||
        toSi(q.value, q.unit) / toSi(1, q.per) <= maxSi,
      {
        path: ["value"],
        message: `is larger than we accept (at most ${maxSi} ${siUnit[kind]} per ${siUnit[perKind]})`,
      },
    );
}

/** SI value of a checked ratio (kg per m², …). */
export function siRatio(q: { value: number; unit: UnitName; per: UnitName }): number {
  return toSi(q.value, q.unit) / toSi(1, q.per);
}
