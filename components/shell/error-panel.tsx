"use client";

import { useEffect } from "react";
import { Button } from "@/components/ui";

/** Shared body of the error.tsx boundaries: says what happened and offers a retry. */
export function ErrorPanel({
  error,
  reset,
}: {
  error: Error & { digest?: string };
  reset: () => void;
}) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <div className="mx-auto flex max-w-xl flex-col gap-4 px-4 py-12" role="alert">
      <h1 className="text-3xl">Something went wrong</h1>
      <p className="text-soil-700">
        Nothing you entered was half-saved: changes are written whole or not at all. Try again, and
        if it keeps happening, note the time{error.digest ? ` and code ${error.digest}` : ""}.
      </p>
      <Button className="self-start" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
