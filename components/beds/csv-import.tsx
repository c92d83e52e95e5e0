"use client";

import { useQueryClient } from "@tanstack/react-query";
import { parse } from "papaparse";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { Alert, Button, buttonStyles } from "@/components/ui";
import { apiFetch, ApiError } from "@/lib/api-client";
import {
  readBedsCsvRecords,
  type BedsCsvRead,
  type CsvBed,
  type CsvCrop,
  type CsvProblem,
} from "@/lib/plantings/beds-csv-read";
import { queryKeys } from "@/lib/query-keys";
import { BEDS_CSV_MAX_BYTES } from "@/lib/validation/beds-csv";
import { countOf, CsvPreview } from "./csv-preview";

type Stage =
  | { step: "idle" }
  | { step: "reading"; percent: number }
  | { step: "read"; read: BedsCsvRead; text: string; fileName: string }
  | { step: "importing"; read: BedsCsvRead; text: string; fileName: string }
  | { step: "done"; beds: number; plantings: number }
  | { step: "failed"; message: string; problems?: string };

/** Small pieces so a large file shows its progress (and the page stays responsive) while it is read. */
const CHUNK_BYTES = 16 * 1024;

/** Reads the file in the browser with papaparse, chunk by chunk, reporting how far it got. */
function readRecords(
  file: File,
  onProgress: (percent: number) => void,
): Promise<{ records: string[][]; problems: CsvProblem[] }> {
  return new Promise((resolve) => {
    const records: string[][] = [];
    const problems: CsvProblem[] = [];
    parse<string[]>(file, {
      chunkSize: CHUNK_BYTES,
      skipEmptyLines: false,
      chunk: (results) => {
        for (const e of results.errors)
          problems.push({
            row: records.length + (e.row ?? 0) + 1,
            column: "(whole row)",
            message: `The file is not well-formed CSV here: ${e.message}.`,
          });
        records.push(...results.data);
        onProgress(Math.min(99, Math.round((results.meta.cursor / Math.max(1, file.size)) * 100)));
      },
      complete: () => resolve({ records, problems }),
      error: (e) =>
        resolve({ records, problems: [{ row: 1, column: "(whole file)", message: e.message }] }),
    });
  });
}

/** Pick a CSV, see every row checked (errors by row and column), then import all of it or nothing. */
export function CsvImport({
  gardenId,
  crops,
  beds,
}: {
  gardenId: string;
  crops: CsvCrop[];
  beds: CsvBed[];
}) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const inputId = useId();
  const [stage, setStage] = useState<Stage>({ step: "idle" });

  async function onFile(file: File | undefined) {
    if (!file) return;
    if (file.size > BEDS_CSV_MAX_BYTES) {
      setStage({
        step: "failed",
        message: `${file.name} is ${(file.size / 1e6).toFixed(1)} MB; a file can be at most ${BEDS_CSV_MAX_BYTES / 1e6} MB. Split it into smaller files.`,
      });
      return;
    }
    setStage({ step: "reading", percent: 0 });
    const { records, problems } = await readRecords(file, (percent) =>
      setStage({ step: "reading", percent }),
    );
    const read = readBedsCsvRecords(records, { crops, beds });
    read.problems.unshift(...problems);
    setStage({ step: "read", read, text: await file.text(), fileName: file.name });
  }

  async function onImport() {
    if (stage.step !== "read") return;
    setStage({ ...stage, step: "importing" });
    try {
      const { imported } = await apiFetch<{ imported: { beds: number; plantings: number } }>(
        `/api/gardens/${gardenId}/beds/import`,
        { body: { csv: stage.text } },
      );
      await queryClient.invalidateQueries({ queryKey: queryKeys.plan(gardenId) });
      await queryClient.invalidateQueries({ queryKey: queryKeys.beds(gardenId) });
      await queryClient.invalidateQueries({ queryKey: queryKeys.plantings(gardenId) });
      setStage({ step: "done", ...imported });
      router.refresh();
    } catch (e) {
      setStage({
        step: "failed",
        message: e instanceof ApiError ? e.message : "That did not work.",
        problems: e instanceof ApiError ? e.fields?.csv : undefined,
      });
    }
  }

  const busy = stage.step === "reading" || stage.step === "importing";
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-col gap-1.5">
        <label htmlFor={inputId} className="font-semibold">
          CSV file
        </label>
        <input
          id={inputId}
          type="file"
          accept=".csv,text/csv"
          disabled={busy}
          className="min-h-11 max-w-full text-sm file:mr-3 file:min-h-11 file:rounded-control file:border file:border-loam-300 file:bg-white file:px-4 file:font-semibold"
          onChange={(e) => onFile(e.target.files?.[0])}
        />
        <p className="text-sm text-soil-700">
          At most {BEDS_CSV_MAX_BYTES / 1e6} MB. Nothing is saved until you press Import.
        </p>
      </div>
      {busy ? (
        <div className="flex flex-col gap-1.5" aria-live="polite">
          <span id={`${inputId}-progress`}>
            {stage.step === "reading"
              ? `Checking the file… ${stage.percent} %`
              : `Importing ${countOf(stage.read.plantings.length, "planting")}…`}
          </span>
          <progress
            aria-labelledby={`${inputId}-progress`}
            className="h-3 w-full accent-leaf-700"
            max={100}
            value={stage.step === "reading" ? stage.percent : undefined}
          />
        </div>
      ) : null}
      {stage.step === "failed" ? (
        <Alert tone="danger" urgent title="Nothing was imported">
          <p>{stage.message}</p>
          {stage.problems ? (
            <pre className="mt-2 whitespace-pre-wrap text-sm">{stage.problems}</pre>
          ) : null}
        </Alert>
      ) : null}
      {stage.step === "done" ? (
        <Alert tone="info" urgent title="Imported">
          <p>
            Imported {countOf(stage.beds, "new bed or container", "new beds or containers")} and{" "}
            {countOf(stage.plantings, "planting")}.{" "}
            <a href={`/g/${gardenId}/beds`} className="text-leaf-800 underline">
              See the beds
            </a>
          </p>
        </Alert>
      ) : null}
      {stage.step === "read" || stage.step === "importing" ? (
        <>
          <CsvPreview read={stage.read} fileName={stage.fileName} />
          {stage.read.problems.length ? null : (
            <Button
              onClick={onImport}
              pending={stage.step === "importing"}
              disabled={!stage.read.plantings.length && !stage.read.newBeds.length}
              className="self-start"
            >
              Import {countOf(stage.read.newBeds.length, "bed")} and{" "}
              {countOf(stage.read.plantings.length, "planting")}
            </Button>
          )}
        </>
      ) : null}
      <p className="text-sm">
        <a
          href={`/api/gardens/${gardenId}/beds/export?template=1`}
          className={buttonStyles({ variant: "ghost", size: "sm" })}
        >
          Download the template
        </a>
      </p>
    </div>
  );
}
