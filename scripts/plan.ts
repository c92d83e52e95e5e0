// npm run plan -- <scenario.json> [--months 12] [--from YYYY-MM] [--format json|table]
// Reads a whole garden (validated by lib/validation/scenario.ts) and prints its balance.
import { main } from "./plan-cli";

main();
