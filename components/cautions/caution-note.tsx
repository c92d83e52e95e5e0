import { Alert, type AlertTone } from "@/components/ui";
import type { Caution } from "@/lib/cautions";

/** Where the words of a caution come from, folded away so the body reads plainly. */
function Sources({ sources }: { sources: readonly string[] }) {
  return (
    <details className="mt-1 text-sm text-soil-700">
      <summary className="inline-flex min-h-6 cursor-pointer items-center underline underline-offset-4">
        Sources
      </summary>
      <ul className="mt-1 list-disc pl-5">
        {sources.map((s) => (
          <li key={s}>{s}</li>
        ))}
      </ul>
    </details>
  );
}

/** A caution as a boxed note: on a bin page, beside a harvest log. */
export function CautionNote({ caution, tone = "caution" }: { caution: Caution; tone?: AlertTone }) {
  return (
    <Alert tone={tone} title={caution.title} data-testid={`caution-${caution.id}`}>
      <p>{caution.body}</p>
      <Sources sources={caution.sources} />
    </Alert>
  );
}

/** A caution as one short line under a list of feedings. */
export function CautionLine({ caution }: { caution: Caution }) {
  return (
    <div className="text-sm text-clay-800" data-testid={`caution-${caution.id}`}>
      <p>
        <strong>{caution.title}:</strong> {caution.body}
      </p>
      <Sources sources={caution.sources} />
    </div>
  );
}
