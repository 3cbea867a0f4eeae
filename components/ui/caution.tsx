/** The caution carried by every result page and report. */
export const CAUTION_TEXT =
  "Loads shown here are design estimates, by the handbook's published residential load-factor procedure as implemented in Platload or by Platload's own hourly method (each result names which). Neither is a certified implementation or any standard's approved procedure; local codes and a licensed professional's review govern equipment sizing.";

export function Caution({ className = "" }: { className?: string }) {
  return (
    <p
      data-testid="caution"
      className={`rounded border border-amber-200 bg-caution-50 px-3 py-2 text-xs text-caution-800 ${className}`}
    >
      {CAUTION_TEXT}
    </p>
  );
}
