// npx tsx scripts/bench-hash.ts: SHA-256 of the whole plan (with gap suggestions) as JSON for the bench
// gardens of 50, 500 and 5,000 plantings. A speed change must leave these unchanged; a change
// of results on purpose re-baselines them and says why in its commit.
import { createHash } from "node:crypto";
import { computePlan } from "@/lib/engine";
import { benchGarden } from "@/scripts/bench-garden";

for (const n of [50, 500, 5000]) {
  const json = JSON.stringify(computePlan(benchGarden(n)));
  const hash = createHash("sha256").update(json).digest("hex");
  process.stdout.write(`${String(n).padStart(5)} plantings  ${hash}  ${json.length} chars\n`);
}
