/** The one error shape the API returns: a code that knows its HTTP status, a message, field errors. */
export const ERROR_STATUS = {
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  invalid_input: 400,
  conflict: 409,
  rate_limited: 429,
  payload_too_large: 413,
  unavailable: 503,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

export interface FieldError {
  /** Dotted field path, or for a table "row 4, column Front wall gross (ft²)". */
  field: string;
  message: string;
  row?: number;
  column?: string;
}

export interface ErrorBody {
  /** fieldErrors holds at most MAX_FIELD_ERRORS; fieldErrorCount says how many there were in all. */
  error: { code: ErrorCode; message: string; fieldErrors?: FieldError[]; fieldErrorCount?: number };
}

/** An answer lists at most this many bad fields or cells (the first ones) and the total count. */
export const MAX_FIELD_ERRORS = 200;

export class AppError extends Error {
  readonly code: ErrorCode;
  readonly fieldErrors?: FieldError[];

  constructor(code: ErrorCode, message: string, fieldErrors?: FieldError[]) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.fieldErrors = fieldErrors;
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }

  toBody(): ErrorBody {
    const fields = this.fieldErrors
      ? { fieldErrors: this.fieldErrors.slice(0, MAX_FIELD_ERRORS), fieldErrorCount: this.fieldErrors.length }
      : {};
    return { error: { code: this.code, message: this.message, ...fields } };
  }
}

export const notFound = (what: string) => new AppError("not_found", `${what} was not found in this account.`);
