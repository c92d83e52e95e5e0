// npm run plan -- <scenario.json> [--months 12] [--from YYYY-MM] [--format json|table]
// Reads a whole garden (validated by lib/validation/scenario.ts) and prints its balance.
import { relaunchWithImportCondition } from "./esm-relaunch";

if (relaunchWithImportCondition()) {
  // Loaded only now, so that nothing touches `convert` before the relaunch.
  // eslint-disable-next-line @typescript-eslint/no-require-imports -- must load after the check above
  (require("./plan-cli") as typeof import("./plan-cli")).main();
}
