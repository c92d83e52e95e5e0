import { addDays, type BinTask } from "@/lib/engine";

// Which tray of a stack is doing what today, from the engine's tray tasks:
// the top tray fills from the day it went on; the ones under it process; the
// bottom one is ready when its harvest day has come.

export type TrayState = "filling" | "processing" | "ready" | "empty";

export interface TrayView {
  /** 1 = top. */
  position: number;
  state: TrayState;
  /** The day the tray went on (null for a slot not used yet). */
  addedOn: string | null;
  /** When it should be finished (added + processing days). */
  readyOn: string | null;
}

export function trayStack({
  startedOn,
  trayCount,
  processingDays,
  rotationDays,
  tasks,
  today,
}: {
  startedOn: string;
  trayCount: number;
  processingDays: number;
  /** Days between trays: the plan's tasks start at this month, so earlier trays follow the cadence. */
  rotationDays: number;
  tasks: readonly BinTask[];
  today: string;
}): TrayView[] {
  const added = [startedOn];
  for (let day = addDays(startedOn, rotationDays); day <= today; day = addDays(day, rotationDays))
    added.push(day);
  added.push(...tasks.filter((t) => t.kind === "add-tray" && t.date <= today).map((t) => t.date));
  const onStack = [...new Set(added)].sort().reverse().slice(0, trayCount);
  return Array.from({ length: trayCount }, (_, i): TrayView => {
    const addedOn = onStack[i] ?? null;
    if (!addedOn) return { position: i + 1, state: "empty", addedOn: null, readyOn: null };
    const readyOn = addDays(addedOn, processingDays);
    const state: TrayState = i === 0 ? "filling" : readyOn <= today ? "ready" : "processing";
    return { position: i + 1, state, addedOn, readyOn };
  });
}
