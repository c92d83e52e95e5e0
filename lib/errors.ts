import type { ZodError } from "zod";
import { logError } from "./log";

// One error type for the whole app. A code names what went wrong and which
// thing it concerns ("forbidden:bed"); the part before the colon picks the
// HTTP status and a message that is safe to show anybody.

const statusByKind = {
  bad_request: 400,
  validation: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  method_not_allowed: 405,
  request_timeout: 408,
  conflict: 409,
  gone: 410,
  payload_too_large: 413,
  unsupported_media_type: 415,
  rate_limited: 429,
  unavailable: 503,
  internal: 500,
} as const;

export type ErrorKind = keyof typeof statusByKind;
export type ErrorCode = ErrorKind | `${ErrorKind}:${string}`;

const defaultMessages: Record<ErrorKind, string> = {
  bad_request: "The request could not be read.",
  validation: "Some fields need attention.",
  unauthorized: "Please sign in first.",
  forbidden: "Your role in this garden does not allow that.",
  not_found: "We could not find that.",
  method_not_allowed: "That address does not accept this kind of request.",
  request_timeout: "The request took too long to arrive.",
  conflict: "That clashes with something that already exists.",
  gone: "That link has expired or was already used.",
  payload_too_large: "The request is too large.",
  unsupported_media_type: "Send the request as JSON (Content-Type: application/json).",
  rate_limited: "Too many attempts. Please wait a little and try again.",
  unavailable: "A service we depend on is not answering. Please try again shortly.",
  internal: "Something went wrong on our side. Please try again.",
};

export type FieldErrors = Record<string, string>;

export class AppError extends Error {
  readonly kind: ErrorKind;
  constructor(
    readonly code: ErrorCode,
    message?: string,
    readonly fields?: FieldErrors,
    readonly headers?: Record<string, string>,
  ) {
    const kind = code.split(":")[0] as ErrorKind;
    super(message ?? defaultMessages[kind] ?? defaultMessages.internal);
    this.kind = kind in statusByKind ? kind : "internal";
    this.name = "AppError";
  }

  get status(): number {
    return statusByKind[this.kind];
  }
}

/** Turns a zod error into field → message, with nested paths joined by dots. */
export function fieldErrorsFromZod(error: ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_";
    fields[key] ??= issue.message;
  }
  return fields;
}

export function validationError(error: ZodError): AppError {
  const fields = fieldErrorsFromZod(error);
  const names = Object.keys(fields).filter((k) => k !== "_");
  const message = names.length
    ? `Please check: ${names.join(", ")}.`
    : (fields._ ?? defaultMessages.validation);
  return new AppError("validation", message, fields);
}

export interface ErrorBody {
  error: { code: string; message: string; fields?: FieldErrors };
}

// API answers are per person and per moment: no browser or proxy may keep them.
export const NO_STORE = { "Cache-Control": "no-store" } as const;

/** The only way a handler turns an error into a response: internals are logged (redacted), never sent. */
export function toResponse(error: unknown): Response {
  if (error instanceof AppError) {
    const body: ErrorBody = { error: { code: error.code, message: error.message } };
    if (error.fields) body.error.fields = error.fields;
    return Response.json(body, {
      status: error.status,
      headers: { ...NO_STORE, ...error.headers },
    });
  }
  logError("unexpected error", error);
  const body: ErrorBody = { error: { code: "internal", message: defaultMessages.internal } };
  return Response.json(body, { status: 500, headers: NO_STORE });
}
