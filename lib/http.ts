import type { z } from "zod";
import { requireUser } from "@/lib/auth/session";
import { enterRequest } from "./draining";
import { getEnv } from "./env";
import { AppError, NO_STORE, toResponse, validationError } from "./errors";

type RouteContext<P> = { params: Promise<P> };
type Handler<P> = (request: Request, context: RouteContext<P>) => Promise<Response>;

export const HTTP_METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;
export type HttpMethod = (typeof HTTP_METHODS)[number];
const WRITE_METHODS = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/**
 * Wraps a route handler: refuses cross-site writes, counts the request for a
 * graceful stop, marks the answer no-store, and turns every failure into our
 * JSON error body (AppErrors with their status, anything else a logged 500).
 */
export function route<P = Record<string, string>>(fn: Handler<P>): Handler<P> {
  return async (request, context) => {
    const leave = enterRequest();
    if (!leave) {
      return toResponse(
        new AppError(
          "unavailable:stopping",
          "The server is restarting. Please try again.",
          undefined,
          {
            "Retry-After": "5",
            Connection: "close",
          },
        ),
      );
    }
    try {
      assertSameOrigin(request);
      assertDeclaredSize(request);
      return withNoStore(await fn(request, context));
    } catch (error) {
      return toResponse(error);
    } finally {
      leave();
    }
  };
}

function withNoStore(response: Response): Response {
  try {
    if (!response.headers.has("Cache-Control"))
      response.headers.set("Cache-Control", NO_STORE["Cache-Control"]);
  } catch {
    // Response.redirect() has immutable headers; redirects carry no data.
  }
  return response;
}

// Refused before the session lookup or anything else: no need to wait for 20 MB that will be refused.
function assertDeclaredSize(request: Request): void {
  const declared = request.headers.get("content-length");
  if (declared !== null && Number(declared) > BODY_LIMIT_BYTES) throw tooLarge(BODY_LIMIT_BYTES);
}

/**
 * CSRF defence for state-changing requests (W3C Fetch Metadata; OWASP CSRF
 * cheat sheet): a browser says where a request comes from in Sec-Fetch-Site,
 * or at least in Origin. Only our own origin may write. A request with neither
 * header is not from a browser, so it carries no ambient cookie to abuse.
 */
function assertSameOrigin(request: Request): void {
  if (!WRITE_METHODS.has(request.method)) return;
  const site = request.headers.get("sec-fetch-site");
  const origin = request.headers.get("origin");
  if (site !== null) {
    if (site === "same-origin" || site === "none") return;
    throw crossSite();
  }
  if (origin === null) return;
  if (!isOwnOrigin(request, origin)) throw crossSite();
}

function crossSite(): AppError {
  return new AppError(
    "forbidden:cross_site",
    "Requests from other sites may not change anything here.",
  );
}

function isOwnOrigin(request: Request, origin: string): boolean {
  let url: URL;
  try {
    url = new URL(origin);
  } catch {
    return false; // includes the opaque "null" origin
  }
  const configured = getEnv().AUTH_URL;
  if (configured && new URL(configured).origin === url.origin) return true;
  if (new URL(request.url).origin === url.origin) return true;
  // Next builds request.url from its own hostname; the browser's Host is what it asked for.
  const host = request.headers.get("host");
  return host !== null && host.toLowerCase() === url.host;
}

/** Answers for the methods a route file does not export: a JSON 405 naming the ones it does. */
export function refuseOtherMethods<H extends Partial<Record<HttpMethod, unknown>>>(
  implemented: H,
): Record<Exclude<HttpMethod, keyof H>, Handler<never>> {
  const allow = HTTP_METHODS.filter((m) => m in implemented).join(", ");
  const refuse = async () =>
    toResponse(new AppError("method_not_allowed", undefined, undefined, { Allow: allow }));
  return Object.fromEntries(
    HTTP_METHODS.filter((m) => !(m in implemented)).map((m) => [m, refuse]),
  ) as unknown as Record<Exclude<HttpMethod, keyof H>, Handler<never>>;
}

export const BODY_LIMIT_BYTES = 1_000_000;
export const BODY_TIMEOUT_MS = 10_000;

export interface BodyLimits {
  maxBytes?: number;
  timeoutMs?: number;
}

/**
 * Reads the body as UTF-8 text without trusting the client: a declared
 * Content-Length over the limit is refused before reading, bytes (not
 * characters) are counted as they arrive and reading stops at the limit, and a
 * body that has not fully arrived within the timeout is a 408.
 */
export async function readBody(request: Request, limits: BodyLimits = {}): Promise<string> {
  const maxBytes = limits.maxBytes ?? BODY_LIMIT_BYTES;
  const timeoutMs = limits.timeoutMs ?? BODY_TIMEOUT_MS;
  const declared = request.headers.get("content-length");
  if (declared !== null) {
    if (!/^\d+$/.test(declared.trim()))
      throw new AppError(
        "bad_request:content_length",
        "The Content-Length header is not a number.",
      );
    if (Number(declared) > maxBytes) throw tooLarge(maxBytes);
  }
  if (!request.body) return "";
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  let timer: ReturnType<typeof setTimeout> | undefined;
  const timedOut = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new AppError("request_timeout")), timeoutMs);
  });
  try {
    for (;;) {
      const { done, value } = await Promise.race([reader.read(), timedOut]);
      if (done) break;
      size += value.byteLength;
      if (size > maxBytes) throw tooLarge(maxBytes);
      chunks.push(value);
    }
  } catch (error) {
    // Stop pulling: the rest of a huge or stalled body is never read into memory.
    reader.cancel().catch(() => {});
    throw error;
  } finally {
    clearTimeout(timer);
  }
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(Buffer.concat(chunks));
  } catch {
    throw new AppError("bad_request:encoding", "The request body is not valid UTF-8.");
  }
}

function tooLarge(maxBytes: number): AppError {
  return new AppError(
    "payload_too_large",
    `The request is larger than ${Math.floor(maxBytes / 1000)} kB.`,
  );
}

function isJsonContentType(value: string | null): boolean {
  return value !== null && value.split(";")[0]!.trim().toLowerCase() === "application/json";
}

/**
 * Reads a JSON body and validates it. Only `application/json` is accepted: a
 * cross-site form can send text/plain without a CORS preflight. Malformed JSON
 * is a 400, never a stack trace.
 */
export async function parseJson<S extends z.ZodType>(
  request: Request,
  schema: S,
  limits?: BodyLimits,
): Promise<z.infer<S>> {
  const contentType = request.headers.get("content-type");
  if (contentType !== null && !isJsonContentType(contentType))
    throw new AppError("unsupported_media_type");
  const text = await readBody(request, limits);
  if (text.length && contentType === null) throw new AppError("unsupported_media_type");
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

/**
 * Validates route params. A malformed id cannot name anything that exists, so
 * it is a 404, but only for someone signed in: signed out, every garden URL is
 * a 401 whatever its id looks like.
 */
export async function parseParams<S extends z.ZodType>(
  request: Request,
  params: Promise<unknown>,
  schema: S,
): Promise<z.infer<S>> {
  const parsed = schema.safeParse(await params);
  if (parsed.success) return parsed.data;
  await requireUser(request);
  throw new AppError("not_found");
}
