import { Alert, Table, TBody, Td, Th, THead, Tr } from "@/components/ui";
import type { BedsCsvRead } from "@/lib/plantings/beds-csv-read";

/** "1 planting", "2,000 plantings". */
export function countOf(n: number, one: string, many = `${one}s`): string {
  return `${n.toLocaleString("en-US")} ${n === 1 ? one : many}`;
}

/** Problems shown in full up to this many; the rest are counted. */
const SHOWN = 100;

/** What the file will do, row by row: its problems by row and column, or a summary of what it adds. */
export function CsvPreview({ read, fileName }: { read: BedsCsvRead; fileName: string }) {
  const blank = read.blankRows ? `, ${countOf(read.blankRows, "blank row")} skipped` : "";
  const summary = `${fileName}: ${countOf(read.dataRows, "row")}${blank}.`;
  if (read.problems.length)
    return (
      <div className="flex flex-col gap-3">
        <Alert
          tone="danger"
          urgent
          title={`${countOf(read.problems.length, "problem")}: fix the file and choose it again`}
        >
          <p>{summary} Nothing will be imported while any row has a problem.</p>
        </Alert>
        <Table caption="Problems by row and column">
          <THead>
            <Tr>
              <Th scope="col">Row</Th>
              <Th scope="col">Column</Th>
              <Th scope="col">Problem</Th>
            </Tr>
          </THead>
          <TBody>
            {read.problems.slice(0, SHOWN).map((p, i) => (
              <Tr key={i}>
                <Td>{p.row}</Td>
                <Td className="whitespace-normal">{p.column}</Td>
                <Td className="min-w-48 whitespace-normal">{p.message}</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
        {read.problems.length > SHOWN ? (
          <p className="text-sm text-soil-700">…and {read.problems.length - SHOWN} more.</p>
        ) : null}
      </div>
    );
  const newBeds = read.newBeds.slice(0, 10).map((b) => b.input.name);
  return (
    <Alert tone="info" title="Every row checks out">
      <p>
        {summary} Adds{" "}
        {countOf(read.newBeds.length, "new bed or container", "new beds or containers")}
        {newBeds.length
          ? ` (${newBeds.join(", ")}${read.newBeds.length > 10 ? ", …" : ""})`
          : ""}{" "}
        and {countOf(read.plantings.length, "planting")}.
      </p>
    </Alert>
  );
}
