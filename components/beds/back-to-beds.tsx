import Link from "next/link";

/** The breadcrumb back to a garden's beds list, on every page under it (bed, import, crops). */
export function BackToBeds({ gardenId }: { gardenId: string }) {
  return (
    <nav aria-label="Breadcrumb" className="text-sm">
      <Link
        href={`/g/${gardenId}/beds`}
        className="inline-flex min-h-6 items-center text-leaf-800 underline"
      >
        ← All beds and containers
      </Link>
    </nav>
  );
}
