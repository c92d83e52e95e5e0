import { formatDay } from "@/lib/format";

/** "2026-08" → "Aug 2026". */
export function monthLabel(month: string): string {
  return formatDay(`${month}-01`, { month: "short", year: "numeric" });
}
