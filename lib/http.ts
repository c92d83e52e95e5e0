import type { z } from "zod";
import { AppError, toResponse, validationError } from "./errors";

type RouteContext<P> = { params: Promise<P> };

/**
 * Wraps a route handler so every failure leaves as our JSON error body:
 * AppErrors with their status, anything else as a logged 500 without internals.
 */
export function route<P = Record<string, string>>(
  fn: (request: Request, context: RouteContext<P>) => Promise<Response>,
) {
  return async (request: Request, context: RouteContext<P>): Promise<Response> => {
    try {
      return await fn(request, context);
    } catch (error) {
      return toResponse(error);
    }
  };
}

const MAX_BODY_BYTES = 1_000_000;

/** Reads a JSON body and validates it; malformed JSON is a 400, never a stack trace. */
export async function parseJson<S extends z.ZodType>(
  request: Request,
  schema: S,
): Promise<z.infer<S>> {
  const text = await request.text();
  if (text.length > MAX_BODY_BYTES)
    throw new AppError("bad_request:too_large", "The request is too large.");
  let data: unknown;
  try {
    data = text.length ? JSON.parse(text) : {};
  } catch {
    throw new AppError("bad_request:json", "The request body is not valid JSON.");
  }
  return parseWith(schema, data);
}

export function parseWith<S extends z.ZodType>(schema: S, data: unknown): z.infer<S> {
  const parsed = schema.safeParse(data);
  if (!parsed.success) throw validationError(parsed.error);
  return parsed.data;
}

export async function parseParams<S extends z.ZodType>(
  params: Promise<unknown>,
  schema: S,
): Promise<z.infer<S>> {
  const parsed = schema.safeParse(await params);
  // A malformed id cannot name anything that exists: answer as for a missing one.
  if (!parsed.success) throw new AppError("not_found");
  return parsed.data;
}
