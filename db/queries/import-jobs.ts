import "server-only";
import type { Database } from "@/db";
import type { ImportKind } from "@/lib/imports/pipeline";
import { catalogImportSteps } from "./equipment";
import { runImport, type ImportSteps } from "./imports";
import { lotImportSteps } from "./lot-import";
import { planImportSteps } from "./plan-import";

// Each importer's steps, by the import's kind: the one runner runs them all.
const IMPORT_STEPS: Record<ImportKind, ImportSteps<unknown, unknown, unknown>> = {
  plans: planImportSteps as ImportSteps<unknown, unknown, unknown>,
  lots: lotImportSteps as ImportSteps<unknown, unknown, unknown>,
  equipment: catalogImportSteps as ImportSteps<unknown, unknown, unknown>,
};

/** The `import` job: runs the import recorded under this id, whichever importer it is. */
export function runImportJob({ db, importId, data }: { db: Database; importId: number; data?: Uint8Array }) {
  return runImport({ db, importId, data, stepsFor: (kind) => IMPORT_STEPS[kind] });
}
