// Browser-side calls to our own route handlers, turning our error body
// ({ error: { code, message, fields? } }) into an ApiError the forms can show.

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export async function apiFetch<T>(
  url: string,
  init: { method?: string; body?: unknown } = {},
): Promise<T> {
  let response: Response;
  try {
    response = await fetch(url, {
      method: init.method ?? (init.body === undefined ? "GET" : "POST"),
      headers: init.body === undefined ? undefined : { "Content-Type": "application/json" },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
      credentials: "same-origin",
    });
  } catch {
    throw new ApiError(
      0,
      "network",
      "Could not reach Castline. Check your connection and try again.",
    );
  }
  const data = (await response.json().catch(() => ({}))) as {
    error?: { code: string; message: string; fields?: Record<string, string> };
  };
  if (!response.ok) {
    const e = data.error;
    throw new ApiError(
      response.status,
      e?.code ?? "internal",
      e?.message ?? "Something went wrong.",
      e?.fields,
    );
  }
  return data as T;
}
