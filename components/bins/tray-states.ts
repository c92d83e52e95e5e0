import { addDays, daysBetween } from "@/lib/engine";

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

/** A tray event from the bin log: a harvest (bottom tray emptied, back on top) or a tray added. */
export interface LoggedTrayEvent {
  on: string;
  kind: "harvest" | "tray-added";
}

export function trayStack({
  startedOn,
  trayCount,
  processingDays,
  rotationDays,
  logged = [],
  today,
}: {
  startedOn: string;
  trayCount: number;
  processingDays: number;
  /** Days between trays when nothing is logged (the cadence of PRODUCT.md's stacked-tray model). */
  rotationDays: number;
  /** Logged harvests and added trays, oldest first (db/queries/bin-events.ts listTrayEvents). */
  logged?: readonly LoggedTrayEvent[];
  today: string;
}): TrayView[] {
  const events = logged.filter((e) => e.on >= startedOn && e.on <= today);
  const halfRotation = rotationDays / 2;
  // Replay the stack, top first. The cadence adds a tray every rotation and restarts from
  // each logged event. A full stack gives up its bottom tray when one goes on; a harvest
  // empties the bottom tray, which goes back on top to fill. A scheduled tray that a logged
  // event within half a rotation stands for (an added tray, or a harvest once the stack is
  // full, when adding means harvesting) is not counted twice.
  const stack: string[] = [startedOn];
  const putOnTop = (day: string) => {
    stack.unshift(day);
    if (stack.length > trayCount) stack.pop();
  };
  let next = addDays(startedOn, rotationDays);
  let i = 0;
  for (;;) {
    const event = events[i];
    if (next <= today && (!event || next < event.on)) {
      const standsIn =
        event !== undefined &&
        daysBetween(next, event.on) <= halfRotation &&
        (event.kind === "tray-added" || stack.length >= trayCount);
      if (!standsIn) putOnTop(next);
      next = addDays(next, rotationDays);
    } else if (event) {
      if (event.kind === "harvest") stack.pop();
      putOnTop(event.on);
      next = addDays(event.on, rotationDays);
      i += 1;
    } else break;
  }

  return Array.from({ length: trayCount }, (_, i): TrayView => {
    const addedOn = stack[i] ?? null;
    if (!addedOn) return { position: i + 1, state: "empty", addedOn: null, readyOn: null };
    const readyOn = addDays(addedOn, processingDays);
    const state: TrayState = i === 0 ? "filling" : readyOn <= today ? "ready" : "processing";
    return { position: i + 1, state, addedOn, readyOn };
  });
}
