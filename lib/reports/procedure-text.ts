/**
 * How reports, schedules, the CLI and the pages name the load procedure. Plain data, no pdfkit:
 * the browser imports it too. The handbook's residential procedure is always stated as the
 * published procedure as implemented here, never as a certified or approved implementation.
 */
import { LOAD_PROCEDURE_LABELS, type LoadProcedure } from "../load/results";

/** For grid cells, badges and table columns. */
export const PROCEDURE_SHORT_LABELS: Record<LoadProcedure, string> = {
  "residential-load-factor": "Handbook load-factor (ch. 17)",
  hourly: "Hourly with heat storage (ch. 18)",
};

/** The procedure in one sentence, as reports state it. */
export const PROCEDURE_STATEMENTS: Record<LoadProcedure, string> = {
  "residential-load-factor": `${LOAD_PROCEDURE_LABELS["residential-load-factor"]}: the handbook's published residential procedure as implemented in Platload, not a certified or approved implementation`,
  hourly: `${LOAD_PROCEDURE_LABELS.hourly}, Platload's own method`,
};

/** Why a result has no peak hour or 24-hour profile. */
export const PEAK_ONLY_NOTE =
  "The handbook's residential load-factor procedure gives the design peak only: no peak hour and no 24-hour profile.";

/** "at solar hour 16", or the peak of a procedure that gives no hour. */
export function peakWhen(peakHour: number | null): string {
  return peakHour === null ? "at the design peak" : `at solar hour ${peakHour}`;
}
