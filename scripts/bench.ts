/**
 * `npm run bench`: runs each benchmark and prints its figures. Add further benchmarks to
 * scripts/bench/ and list them here. Timings are printed, never asserted.
 */
import { runEngineBenchmark } from "./bench/engine";

const benchmarks: Array<{ name: string; run: () => { lines: string[] } }> = [{ name: "engine", run: runEngineBenchmark }];

for (const bench of benchmarks) {
  const result = bench.run();
  for (const line of result.lines) console.log(line);
}
