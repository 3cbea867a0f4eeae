/**
 * The one error of lib/reports: bad input to a schedule or a report, naming every field
 * (a dotted path such as `lots.3.plannedStart`) with what is wrong and the valid range or
 * choices. Nothing is produced when it is thrown.
 */
export interface ReportInputIssue {
  field: string;
  message: string;
}

export class ReportInputError extends Error {
  readonly field: string;
  readonly issues: ReportInputIssue[];

  constructor(issues: ReportInputIssue[]) {
    if (issues.length === 0) throw new Error("ReportInputError needs at least one issue");
    const summary =
      issues.length === 1
        ? `${issues[0].field}: ${issues[0].message}`
        : `${issues.length} input problems: ${issues.map((issue) => `${issue.field}: ${issue.message}`).join("; ")}`;
    super(summary);
    this.name = "ReportInputError";
    this.field = issues[0].field;
    this.issues = issues;
  }
}
