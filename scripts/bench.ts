// npm run bench: time computePlan on invented gardens of 50, 500 and 5,000 plantings,
// then loading the demo garden's inputs from PGlite. (`npm run bench:http` measures the
// Balance endpoint against a running server; it needs a build.)
import { benchDbLoad, formatDbLoad } from "./bench-db-load";
import { main } from "./bench-run";

main();
benchDbLoad()
  .then((figures) => process.stdout.write(formatDbLoad(figures) + "\n"))
  .catch((error: unknown) => {
    console.error("database load bench failed:", error);
    process.exitCode = 1;
  });
