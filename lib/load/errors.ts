/**
 * Typed errors of the load engine. Every bad input names its field (a dotted path such as
 * `facades.front.window.areaFt2`) and, where one exists, the valid range.
 */

/** A valid range for a numeric field, in the field's own unit. */
export interface ValidRange {
  min?: number;
  max?: number;
  unit?: string;
}

/** One problem with one field of the input. */
export interface LoadInputIssue {
  /** Dotted path of the field, e.g. `facades.left.window.shgc`. */
  field: string;
  message: string;
  range?: ValidRange;
}

/**
 * Thrown for any input the engine refuses. `field`, `message` and `range` describe the first
 * problem; `issues` lists every problem found (a grid import can mark every bad cell at once).
 */
export class LoadInputError extends Error {
  readonly field: string;
  readonly range?: ValidRange;
  readonly issues: LoadInputIssue[];

  constructor(field: string, message: string, range?: ValidRange, issues?: LoadInputIssue[]) {
    const first: LoadInputIssue = { field, message, range };
    const all = issues && issues.length > 0 ? issues : [first];
    const summary =
      all.length === 1
        ? `${field}: ${message}`
        : `${all.length} input problems: ${all.map((i) => `${i.field}: ${i.message}`).join("; ")}`;
    super(summary);
    this.name = "LoadInputError";
    this.field = field;
    this.range = range;
    this.issues = all;
  }

  /** One error carrying several issues; the first one gives `field`, `message` and `range`. */
  static fromIssues(issues: LoadInputIssue[]): LoadInputError {
    if (issues.length === 0) throw new Error("LoadInputError.fromIssues needs at least one issue");
    const [first] = issues;
    return new LoadInputError(first.field, first.message, first.range, issues);
  }
}
