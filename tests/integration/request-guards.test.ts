import "@/tests/support/integration/env";
import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as gardenRoute from "@/app/api/gardens/[gardenId]/route";
import * as gardensRoute from "@/app/api/gardens/route";
import * as notFoundRoute from "@/app/api/[...path]/route";
import { readBody } from "@/lib/http";
import {
  BASE_URL,
  call,
  closeHarness,
  countRows,
  errorCode,
  gardenInput,
  signUpUser,
  type Handler,
  type TestUser,
} from "@/tests/support/integration/harness";
import { matrixExclusions } from "@/tests/support/integration/role-matrix-table";

// Guards every route gets from lib/http.ts. Status codes from RFC 9110 §15
// (405 must carry Allow, §15.5.6; 408, 413, 415); the Fetch metadata and Origin
// rules from the W3C "Fetch Metadata Request Headers" spec and OWASP's CSRF cheat sheet.

let ann: TestUser;
beforeAll(async () => {
  ann = await signUpUser("guard");
});
afterAll(closeHarness);

const noParams = { params: Promise.resolve({}) as Promise<never> };

describe("ids and auth", () => {
  it("a signed-out request with a malformed id gets 401, not 404", async () => {
    for (const handler of [gardenRoute.GET, gardenRoute.PATCH, gardenRoute.DELETE] as Handler[]) {
      const res = await call(handler, { url: "/api/gardens/nope", params: { gardenId: "nope" } });
      expect(res.status).toBe(401);
      expect(errorCode(res)).toBe("unauthorized");
    }
  });

  it("signed in, a malformed id is still a 404", async () => {
    const res = await call(gardenRoute.GET as Handler, {
      url: "/api/gardens/nope",
      params: { gardenId: "nope" },
      cookie: ann.cookie,
    });
    expect(res.status).toBe(404);
  });
});

describe("caching", () => {
  it("API answers carry Cache-Control: no-store, success and error alike", async () => {
    const ok = await call(gardensRoute.GET, { url: "/api/gardens", cookie: ann.cookie });
    expect(ok.status).toBe(200);
    expect(ok.headers.get("cache-control")).toBe("no-store");
    const refused = await call(gardensRoute.GET, { url: "/api/gardens" });
    expect(refused.headers.get("cache-control")).toBe("no-store");
  });
});

describe("unknown paths and methods", () => {
  it("an unknown /api path answers our JSON 404 for every method", async () => {
    for (const method of ["GET", "POST", "PUT", "PATCH", "DELETE"] as const) {
      const res = await call(notFoundRoute[method] as Handler, {
        method,
        url: "/api/no-such-thing",
        params: { path: "no-such-thing" },
      });
      expect(res.status, method).toBe(404);
      expect(errorCode(res)).toBe("not_found:route");
    }
  });

  it("every route file answers a method it lacks with a JSON 405 and an Allow header", async () => {
    const apiDir = path.join(process.cwd(), "app", "api");
    const files = (fs.readdirSync(apiDir, { recursive: true }) as string[])
      .filter((f) => f.endsWith("route.ts"))
      .map((f) => path.posix.join("app/api", f.split(path.sep).join("/")))
      .filter((f) => !(f in matrixExclusions) && !(f in methodGuardExclusions));
    expect(files.length).toBeGreaterThan(10);
    for (const file of files) {
      const mod = (await import(`@/${file}`)) as Record<string, Handler | undefined>;
      const source = fs.readFileSync(path.join(process.cwd(), file), "utf8");
      const own = [
        ...source.matchAll(
          /export\s+(?:const|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE)\b/g,
        ),
      ].map((m) => m[1]!);
      for (const method of ["GET", "POST", "PUT", "PATCH", "DELETE"].filter(
        (m) => !own.includes(m),
      )) {
        const handler = mod[method];
        expect(handler, `${method} ${file}`).toBeTypeOf("function");
        const res = await call(handler!, { method, url: "/api/x", cookie: ann.cookie });
        expect(res.status, `${method} ${file}`).toBe(405);
        expect(errorCode(res)).toBe("method_not_allowed");
        const allow = (res.headers.get("allow") ?? "").split(/,\s*/).sort();
        expect(allow, file).toEqual([...own].sort());
      }
    }
  });
});

/** Route files another branch owned when the guard landed; add the one-line export when touching them. */
const methodGuardExclusions: Record<string, string> = {};

function post(headers: Record<string, string>, body: BodyInit = JSON.stringify(gardenInput())) {
  return new Request(`${BASE_URL}/api/gardens`, {
    method: "POST",
    headers: { cookie: ann.cookie, "content-type": "application/json", ...headers },
    body,
    duplex: "half",
  } as RequestInit);
}

async function send(request: Request) {
  const response = await gardensRoute.POST(request, noParams);
  const json = (await response.json()) as { error?: { code: string; message: string } };
  return { status: response.status, json, headers: response.headers };
}

describe("cross-site writes", () => {
  it.each([
    [{ origin: "https://evil.example" }],
    [{ origin: "null" }],
    [{ "sec-fetch-site": "cross-site" }],
    [{ "sec-fetch-site": "same-site", origin: "https://evil.127.0.0.1" }],
    [{ "sec-fetch-site": "cross-site", origin: BASE_URL }],
  ])("refuses %j with 403 and writes nothing", async (headers) => {
    const before = await countRows("gardens");
    const res = await send(post(headers));
    expect(res.status).toBe(403);
    expect(res.json.error?.code).toBe("forbidden:cross_site");
    expect(await countRows("gardens")).toBe(before);
  });

  it.each([[{ origin: BASE_URL }], [{ "sec-fetch-site": "same-origin", origin: BASE_URL }], [{}]])(
    "accepts our own origin (or a non-browser client without either header) %j",
    async (headers) => {
      expect((await send(post(headers))).status).toBe(201);
    },
  );

  it("refuses JSON sent as text/plain (a form can send that cross-site without a preflight)", async () => {
    const before = await countRows("gardens");
    const res = await send(post({ "content-type": "text/plain" }));
    expect(res.status).toBe(415);
    expect(res.json.error?.code).toBe("unsupported_media_type");
    expect(await countRows("gardens")).toBe(before);
    expect((await send(post({ "content-type": "application/json; charset=utf-8" }))).status).toBe(
      201,
    );
  });
});

const MB = 1024 * 1024;

/** A body of `total` bytes made on demand, counting how much the server pulled. */
function countingStream(total: number) {
  const chunk = new Uint8Array(64 * 1024).fill(0x20);
  const stats = { pulled: 0, cancelled: false };
  const stream = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (stats.pulled >= total) return controller.close();
      stats.pulled += chunk.byteLength;
      controller.enqueue(chunk);
    },
    cancel() {
      stats.cancelled = true;
    },
  });
  return { stream, stats };
}

describe("request bodies", () => {
  it("refuses a declared Content-Length over the limit before reading any of it", async () => {
    const { stream, stats } = countingStream(20 * MB);
    const res = await send(post({ "content-length": String(20 * MB) }, stream));
    expect(res.status).toBe(413);
    expect(res.json.error?.code).toBe("payload_too_large");
    expect(stats.pulled).toBeLessThanOrEqual(128 * 1024);
  });

  it("stops reading a 100 MB stream at the limit", async () => {
    const { stream, stats } = countingStream(100 * MB);
    const res = await send(post({}, stream));
    expect(res.status).toBe(413);
    expect(stats.pulled).toBeLessThan(1.2 * MB);
  });

  it("counts bytes, not characters", async () => {
    // 600,000 × "é" is 600,000 UTF-16 units but 1,200,000 UTF-8 bytes (RFC 3629): over 1 MB.
    const body = JSON.stringify({ ...gardenInput(), name: "é".repeat(600_000) });
    expect(body.length).toBeLessThan(1_000_000);
    const res = await send(post({}, body));
    expect(res.status).toBe(413);
  });

  it("times out a body that never finishes", async () => {
    const stream = new ReadableStream<Uint8Array>({
      start(controller) {
        controller.enqueue(new TextEncoder().encode('{"name":'));
      },
    });
    const request = post({}, stream);
    const started = Date.now();
    const outcome = await readBody(request, { timeoutMs: 200 }).then(
      () => "read",
      (error: { code?: string; status?: number }) => `${error.status} ${error.code}`,
    );
    expect(outcome).toBe("408 request_timeout");
    expect(Date.now() - started).toBeLessThan(5_000);
  });
});
