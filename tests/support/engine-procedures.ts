// Whether the engine on this branch runs the handbook's residential load-factor procedure, found
// by asking it (it refuses a procedure it does not run, naming the field "procedure"). Tests
// that need the procedure's own numbers skip, with their reason, while it does not.
import { computeFacingLoads, LoadInputError } from "@/lib/load";
import { ASPEN_1, CEDAR_BEND_SITE } from "../fixtures/engine/example-plans";

function runsLoadFactor(): boolean {
  try {
    computeFacingLoads(ASPEN_1, CEDAR_BEND_SITE, 0, { procedure: "residential-load-factor" });
    return true;
  } catch (error) {
    if (error instanceof LoadInputError && error.field === "procedure") return false;
    throw error;
  }
}

export const engineRunsLoadFactor = runsLoadFactor();
