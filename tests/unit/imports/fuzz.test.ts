/**
 * Property-based fuzzing of every importer's read-and-check stage (the stage the worker runs
 * before it computes and saves): 1,000 generated files per importer per run, seeded, so a failure
 * replays. Each file either checks out (rows to write) or is refused with problems that each name
 * a row, a column and a reason in words — never an exception, never a reader's internals.
 * The route and the worker are fuzzed with a smaller sample in tests/integration/import-fuzz.test.ts.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { readAndCheck, type ImportContext } from "@/lib/imports/kinds";
import type { ImportKind } from "@/lib/imports/pipeline";
import {
  baseTables,
  encodeFuzzFile,
  EXAMPLE_PLAN_CODES,
  fuzzFileSpec,
  INTERNALS,
} from "../../support/import-fuzz";

const RUNS = 1000;
const SEED = 20261202;

const contexts: ImportContext = {
  plans: undefined,
  equipment: undefined,
  lots: { planIds: new Map(EXAMPLE_PLAN_CODES.map((code, i) => [code, i + 1])), existing: new Map() },
};

describe("import fuzzing (read and check stage)", () => {
  const bases = baseTables();
  for (const kind of ["plans", "lots", "equipment"] as ImportKind[]) {
    it(`${kind}: ${RUNS} generated files each check out or are refused with clear problems`, async () => {
      const seen = { accepted: 0, refused: 0 };
      await fc.assert(
        fc.asyncProperty(fuzzFileSpec, async (spec) => {
          const file = await encodeFuzzFile(bases[kind], spec);
          const result = await readAndCheck(kind, file.fileName, file.data, contexts[kind]);
          if (result.ok) {
            seen.accepted++;
            expect((result.value as unknown[]).length, file.how).toBeGreaterThan(0);
            return;
          }
          seen.refused++;
          expect(result.errors.length, file.how).toBeGreaterThan(0);
          for (const problem of result.errors) {
            expect(Number.isInteger(problem.row) && problem.row >= 0, `${file.how}: row ${problem.row}`).toBe(
              true,
            );
            expect(
              typeof problem.column === "string" && problem.column.length > 0,
              `${file.how}: column`,
            ).toBe(true);
            expect(
              typeof problem.reason === "string" && problem.reason.trim().length > 0,
              `${file.how}: reason`,
            ).toBe(true);
            expect(problem.reason, file.how).not.toMatch(INTERNALS);
          }
        }),
        { numRuns: RUNS, seed: SEED, endOnFailure: true },
      );
      console.log(`fuzz ${kind}: ${RUNS} files, ${seen.accepted} accepted, ${seen.refused} refused`);
      // Both outcomes occur, so the generator reaches past the first check.
      expect(seen.accepted).toBeGreaterThan(0);
      expect(seen.refused).toBeGreaterThan(0);
      // Generous for a busy 2-core machine: the plans run takes about 30 s when it has a core to itself.
    }, 240_000);
  }

  it("the file-level messages name the problem", async () => {
    const semicolon = await readAndCheck(
      "lots",
      "lots.csv",
      new TextEncoder().encode("Lot;Address;Plan code;Facing\n1;2 Elm;WF-1480;N\n"),
      contexts.lots,
    );
    expect(semicolon.ok ? "" : semicolon.errors[0].reason).toMatch(/looks semicolon-separated/);
    const tab = await readAndCheck(
      "plans",
      "plans.csv",
      new TextEncoder().encode("Plan code\tPlan name\nA\tB\n"),
      undefined,
    );
    expect(tab.ok ? "" : tab.errors[0].reason).toMatch(/looks tab-separated/);
    const random = await readAndCheck(
      "equipment",
      "catalog.xlsx",
      new Uint8Array(Array.from({ length: 300 }, (_, i) => (i * 37 + 11) % 256)),
      undefined,
    );
    expect(random.ok ? "" : random.errors[0].reason).toMatch(/not a readable XLSX workbook/);
    const junkZip = await readAndCheck(
      "equipment",
      "catalog.xlsx",
      new Uint8Array([0x50, 0x4b, 0x03, 0x04, 1, 2, 3, 4, 5]),
      undefined,
    );
    expect(junkZip.ok ? "" : junkZip.errors[0].reason).toMatch(/not a readable XLSX workbook/);
    expect(junkZip.ok ? "" : junkZip.errors[0].reason).not.toMatch(INTERNALS);
  });
});
