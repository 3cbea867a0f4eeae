/**
 * `npm run bench`: runs each benchmark and prints its figures. Add further benchmarks to
 * scripts/bench/ and list them here. Timings are printed, never asserted.
 * The database benchmarks use the test MariaDB instance (scripts/db.sh start test).
 */
import { runEngineBenchmark } from "./bench/engine";
import { runLotsImportBenchmark } from "./bench/lots-import";
import { benchPacket } from "./bench/packet";

const benchmarks: Array<{ name: string; run: () => { lines: string[] } | Promise<{ lines: string[] }> }> = [
  { name: "engine", run: runEngineBenchmark },
  { name: "lots import", run: runLotsImportBenchmark },
  // benchPacket prints its own lines as it goes.
  { name: "permit packet", run: async () => (await benchPacket(), { lines: [] }) },
];

async function main() {
  const only = process.argv[2];
  for (const bench of benchmarks) {
    if (only && !bench.name.includes(only)) continue;
    const result = await bench.run();
    for (const line of result.lines) console.log(line);
  }
}

main().then(
  () => process.exit(0),
  (error: unknown) => {
    console.error(error);
    process.exit(1);
  },
);
