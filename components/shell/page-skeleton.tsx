import { Skeleton } from "@/components/ui";

/** Placeholder while a server page loads: the rough shape of a heading and cards. */
export function PageSkeleton() {
  return (
    <div
      className="mx-auto flex max-w-5xl flex-col gap-4 px-4 py-6"
      aria-busy="true"
      aria-label="Loading"
    >
      <Skeleton className="h-9 w-2/3" />
      <Skeleton className="h-24 w-full" />
      <Skeleton className="h-24 w-full" />
    </div>
  );
}
