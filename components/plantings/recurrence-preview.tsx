"use client";

import { describeRrule, nextDates, rruleProblem, whyNoDates } from "@/lib/plantings/recurrence";
import { formatDay } from "@/lib/format";

/** The rule read back in words and as its next five dates (from the planting's first day, not before today). */
export function RecurrencePreview({
  rule,
  anchor,
  today,
}: {
  rule: string;
  anchor: string;
  today: string;
}) {
  if (!rule.trim()) return null;
  const problem = rruleProblem(rule);
  if (problem) return <p className="text-sm font-semibold text-bloom-700">{problem}</p>;
  const why = whyNoDates(rule, anchor);
  if (why) return <p className="text-sm font-semibold text-bloom-700">{why}</p>;
  const dates = nextDates(rule, anchor, 400)
    .filter((d) => d >= today)
    .slice(0, 5);
  return (
    <div className="text-sm text-soil-800" aria-live="polite">
      <p>
        <strong>Repeats</strong> {describeRrule(rule)}.
      </p>
      <p>
        <strong>Next dates:</strong>{" "}
        {dates.length
          ? dates
              .map((d) => formatDay(d, { month: "short", day: "numeric", year: "numeric" }))
              .join(" · ")
          : "none from today"}
      </p>
    </div>
  );
}
