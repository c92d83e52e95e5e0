// npm run bench: time planGarden on invented gardens of 50, 500 and 5,000 plantings.
import { relaunchWithImportCondition } from "./esm-relaunch";

if (relaunchWithImportCondition()) {
  // eslint-disable-next-line @typescript-eslint/no-require-imports -- must load after the check above
  (require("./bench-run") as typeof import("./bench-run")).main();
}
