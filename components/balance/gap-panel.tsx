"use client";

import Link from "next/link";
import { Button, Card, CardBody, buttonStyles } from "@/components/ui";
import { ExplanationText, Figure } from "@/components/balance/explanation";
import type { GardenNames } from "@/components/balance/garden-names";
import { changesForSuggestion, type TryChange } from "@/components/balance/what-if-changes";
import { nameLookup } from "@/components/balance/garden-names";
import { formLinksForSuggestion } from "@/components/balance/suggestion-links";
import type { GapReport } from "@/lib/engine";
import { formatDay } from "@/lib/format";
import { formatPoolAmount } from "@/lib/format-quantity";
import type { UnitSystem } from "@/lib/units";

// The engine's ways to close a castings shortfall, each re-run through the
// balance before it is offered (its remaining shortfall is that re-run's result).

const titles = {
  "extra-trays": "Process more trays",
  "second-bin": "Start a second bin",
  "rate-cut": "Feed lower-priority plantings less",
  "start-bin": "Start a bin",
  "buy-castings": "Buy castings",
} as const;

export function GapPanel({
  gap,
  names,
  system,
  onTry,
  gardenId,
  canEdit,
}: {
  gap: GapReport;
  names: GardenNames;
  system: UnitSystem;
  onTry: (changes: TryChange[]) => void;
  gardenId: string;
  /** Growers and owners get links to the forms that make a suggestion real; others none. */
  canEdit: boolean;
}) {
  if (!gap.needed) return null;
  const nameOf = nameLookup(names);
  return (
    <section
      aria-labelledby="gap-heading"
      className="flex min-w-0 flex-col gap-3"
      data-testid="gap-panel"
    >
      <h2 id="gap-heading" className="text-xl">
        Closing the gap
      </h2>
      <p>
        Castings fall {formatPoolAmount(gap.shortfallKg, "castings", system)} short over these
        months
        {gap.firstShortfall ? `, first on ${formatDay(gap.firstShortfall)}` : ""}
        {gap.leachateShortfallL > 0
          ? `; leachate ${formatPoolAmount(gap.leachateShortfallL, "leachate", system)} short`
          : ""}
        . Each option below was checked by running the balance again with it.
      </p>
      <ul className="grid gap-3 sm:grid-cols-2">
        {gap.suggestions.map((s, i) => {
          const changes = changesForSuggestion(s, names);
          const links = canEdit ? formLinksForSuggestion(s, names, gardenId) : [];
          return (
            <li key={`${s.kind}-${i}`} data-testid={`suggestion-${s.kind}`}>
              <Card className="h-full">
                <CardBody className="flex h-full flex-col gap-2">
                  <h3 className="text-lg">{titles[s.kind]}</h3>
                  <ExplanationText explanation={s.explanation} system={system} nameOf={nameOf} />
                  <p className="text-sm font-semibold">
                    Left short after this:{" "}
                    <Figure title={titles[s.kind]} explanation={s.explanation}>
                      {formatPoolAmount(s.remainingShortfallKg, "castings", system)}
                    </Figure>
                  </p>
                  <div className="mt-auto flex flex-wrap gap-2">
                    {changes && changes.length > 0 ? (
                      <Button variant="secondary" size="sm" onClick={() => onTry(changes)}>
                        Try it in what-if
                      </Button>
                    ) : null}
                    {links.map((l) => (
                      <Link
                        key={l.href}
                        href={l.href}
                        className={buttonStyles({ variant: "secondary", size: "sm" })}
                        data-testid="suggestion-form-link"
                      >
                        {l.label}
                      </Link>
                    ))}
                  </div>
                </CardBody>
              </Card>
            </li>
          );
        })}
      </ul>
      {gap.unavailable.length > 0 ? (
        <details className="text-sm text-soil-700">
          <summary className="min-h-6 cursor-pointer">Options that would not work here</summary>
          <ul className="ml-4 list-disc">
            {gap.unavailable.map((u, i) => (
              <li key={i}>
                {titles[u.kind]}: <ExplanationText explanation={u.explanation} system={system} />
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </section>
  );
}
