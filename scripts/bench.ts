// npm run bench: time planGarden on invented gardens of 50, 500 and 5,000 plantings.
import { main } from "./bench-run";

main();
