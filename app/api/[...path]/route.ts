import { AppError, toResponse } from "@/lib/errors";

// Any /api path no route file claims: our JSON 404 instead of the HTML page.
// Next prefers every more specific route over this catch-all.
async function notFound(): Promise<Response> {
  return toResponse(new AppError("not_found:route", "There is no API at this address."));
}

export const GET = notFound;
export const POST = notFound;
export const PUT = notFound;
export const PATCH = notFound;
export const DELETE = notFound;
