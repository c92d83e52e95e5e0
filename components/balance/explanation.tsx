"use client";

import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from "react";
import { Dialog } from "@/components/ui";
import type { Explanation } from "@/lib/engine";
import { explain, type ExplainedText } from "@/lib/explain-sentences";
import type { UnitSystem } from "@/lib/units";

// One renderer for the engine's explanations: a figure is a button; pressing it
// opens a dialog telling, in plain words and the garden's units, where it came from.

type NameOf = (ref: "bin" | "bed" | "planting" | "lot", id: string) => string | undefined;

interface ExplainApi {
  system: UnitSystem;
  nameOf: NameOf;
  open: (title: string, explanation: Explanation) => void;
}

const ExplainContext = createContext<ExplainApi | null>(null);

export function ExplanationProvider({
  system,
  nameOf,
  children,
}: {
  system: UnitSystem;
  nameOf: NameOf;
  children: ReactNode;
}) {
  const [shown, setShown] = useState<{ title: string; explanation: Explanation } | null>(null);
  const open = useCallback(
    (title: string, explanation: Explanation) => setShown({ title, explanation }),
    [],
  );
  const api = useMemo(() => ({ system, nameOf, open }), [system, nameOf, open]);
  return (
    <ExplainContext.Provider value={api}>
      {children}
      <Dialog open={shown !== null} onClose={() => setShown(null)} title={shown?.title ?? ""}>
        {shown ? (
          <ExplanationText explanation={shown.explanation} system={system} nameOf={nameOf} />
        ) : null}
      </Dialog>
    </ExplainContext.Provider>
  );
}

function Sentences({ text }: { text: ExplainedText }) {
  return (
    <>
      {text.sentences.map((s, i) => (
        <p key={i}>{s}</p>
      ))}
      {text.parts.length > 0 ? (
        <ul className="ml-4 list-disc">
          {text.parts.map((part, i) => (
            <li key={i}>
              <Sentences text={part} />
            </li>
          ))}
        </ul>
      ) : null}
    </>
  );
}

/** An explanation as sentences, parts nested beneath. */
export function ExplanationText({
  explanation,
  system,
  nameOf,
}: {
  explanation: Explanation;
  system: UnitSystem;
  nameOf?: NameOf;
}) {
  const text = explain(explanation, { system, nameOf });
  return (
    <div className="flex flex-col gap-2" data-testid="explanation">
      <Sentences text={text} />
    </div>
  );
}

/**
 * A figure the grower can press to see its explanation. Without a provider
 * (e.g. a static summary) it is plain text.
 */
export function Figure({
  children,
  explanation,
  title,
  className,
}: {
  children: ReactNode;
  explanation: Explanation;
  title: string;
  className?: string;
}) {
  const api = useContext(ExplainContext);
  if (!api) return <span className={className}>{children}</span>;
  return (
    <button
      type="button"
      onClick={() => api.open(title, explanation)}
      className={
        "relative inline-flex min-h-6 min-w-6 items-center rounded-control px-1 tabular-nums underline decoration-dotted underline-offset-4 hover:bg-loam-100 " +
        (className ?? "")
      }
    >
      <span data-figure="">{children}</span>
      <span className="sr-only">, {title}: where this comes from</span>
    </button>
  );
}
