/** The one error shape the API returns: a code that knows its HTTP status, a message, field errors. */
export const ERROR_STATUS = {
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  invalid_input: 400,
  conflict: 409,
  rate_limited: 429,
  payload_too_large: 413,
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
  error: { code: ErrorCode; message: string; fieldErrors?: FieldError[] };
}

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
    return { error: { code: this.code, message: this.message, ...(this.fieldErrors ? { fieldErrors: this.fieldErrors } : {}) } };
  }
}

export const notFound = (what: string) => new AppError("not_found", `${what} was not found in this account.`);
