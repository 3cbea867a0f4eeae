import type { ErrorBody, FieldError } from "@/lib/errors";

/** An API refusal as the client sees it: the server's message and field errors. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fieldErrors: FieldError[];

  constructor(status: number, body: Partial<ErrorBody> | null) {
    super(body?.error?.message ?? `The server answered ${status}.`);
    this.name = "ApiError";
    this.status = status;
    this.code = body?.error?.code ?? "server_error";
    this.fieldErrors = body?.error?.fieldErrors ?? [];
  }
}

/** fetch for TanStack Query: JSON in and out, a refusal thrown as ApiError. */
export async function api<T>(path: string, init?: { method?: string; body?: unknown }): Promise<T> {
  const response = await fetch(path, {
    method: init?.method ?? "GET",
    headers: init?.body !== undefined ? { "content-type": "application/json" } : undefined,
    body: init?.body !== undefined ? JSON.stringify(init.body) : undefined,
    credentials: "same-origin",
  });
  const text = await response.text();
  const data = text ? (JSON.parse(text) as unknown) : null;
  if (!response.ok) throw new ApiError(response.status, data as Partial<ErrorBody> | null);
  return data as T;
}
