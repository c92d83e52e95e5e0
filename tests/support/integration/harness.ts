import "./env";
import { closeDb, getDb } from "@/db";
import { getUserById } from "@/db/queries/users";
import { memberships } from "@/db/schema";
import * as accountRoute from "@/app/api/account/route";
import * as gardensRoute from "@/app/api/gardens/route";
import * as sessionRoute from "@/app/api/session/route";
import { settleAfterResponseWork } from "@/lib/after-response";
import type { Role } from "@/lib/auth/roles";
import { issueSessionCookie } from "@/lib/auth/session";
import { stopLocalSmtpServer } from "@/services/mail";

export * from "./inspect";

// Route handlers are called directly with real Request objects, as Next would
// call them, against a fresh in-memory PGlite per test file.

export const BASE_URL = "http://127.0.0.1:3000";

/** Accepts any of our handlers: `never` params are assignable from every route's own params type. */
export type Handler = (request: Request, context: { params: Promise<never> }) => Promise<Response>;

export interface CallOptions {
  method?: string;
  /** Path (joined to BASE_URL) or absolute URL. */
  url?: string;
  /** A string is sent as-is (for malformed JSON); anything else as JSON. */
  body?: unknown;
  /** "castline.session=..." as returned by signUp/signIn. */
  cookie?: string;
  params?: Record<string, string>;
  headers?: Record<string, string>;
}

export interface CallResult {
  status: number;
  // Response bodies vary per route; tests read them field by field.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  json: any;
  text: string;
  headers: Headers;
  /** The raw Set-Cookie header, if any. */
  setCookie: string | null;
  /** "name=value" of the Set-Cookie header, ready to send back; null when none. */
  cookie: string | null;
}

let addressCounter = 0;
/** A fresh address from 198.18.0.0/15 (RFC 2544, reserved for testing). */
function nextTestAddress(): string {
  addressCounter += 1;
  return `198.${18 + Math.floor(addressCounter / 65_536)}.${Math.floor(addressCounter / 256) % 256}.${addressCounter % 256}`;
}

export async function call(handler: Handler, options: CallOptions = {}): Promise<CallResult> {
  const headers = new Headers(options.headers);
  let body: string | undefined;
  if (options.body !== undefined) {
    body = typeof options.body === "string" ? options.body : JSON.stringify(options.body);
    if (!headers.has("content-type")) headers.set("content-type", "application/json");
  }
  if (options.cookie) headers.set("cookie", options.cookie);
  // Each call from its own address (env.ts trusts one proxy), unless the test picks one.
  if (!headers.has("x-forwarded-for")) headers.set("x-forwarded-for", nextTestAddress());
  const method = options.method ?? (body === undefined ? "GET" : "POST");
  const url = new URL(options.url ?? "/api/test", BASE_URL);
  const request = new Request(url, { method, headers, body });
  const response = await handler(request, {
    params: Promise.resolve(options.params ?? {}) as Promise<never>,
  });
  const text = await response.text();
  let json: unknown = null;
  try {
    json = text ? JSON.parse(text) : null;
  } catch {
    json = null;
  }
  const setCookie = response.headers.get("set-cookie");
  return {
    status: response.status,
    json,
    text,
    headers: response.headers,
    setCookie,
    cookie: setCookie ? setCookie.split(";")[0]! : null,
  };
}

// One strong password for harness accounts: not on the common-password list.
export const TEST_PASSWORD = "tidy-worm-castings-2031";

let counter = 0;
/** A unique example.com address (RFC 2606 reserves example.com for documentation and tests). */
export function uniqueEmail(label: string): string {
  counter += 1;
  return `${label}-${counter}-${Math.random().toString(36).slice(2, 8)}@example.com`;
}

export interface TestUser {
  id: string;
  email: string;
  name: string;
  password: string;
  cookie: string;
}

export async function signUpUser(label: string, password = TEST_PASSWORD): Promise<TestUser> {
  const email = uniqueEmail(label);
  const name = `${label[0]!.toUpperCase()}${label.slice(1)} Tester`;
  const res = await call(accountRoute.POST, {
    url: "/api/account",
    body: { name, email, password },
  });
  if (res.status !== 202 || !res.cookie)
    throw new Error(`sign-up failed (${res.status}): ${res.text}`);
  // The welcome mail goes out after the response; let it land so tests start quiet.
  await settleAfterResponseWork();
  const me = await call(accountRoute.GET, { url: "/api/account", cookie: res.cookie });
  if (me.status !== 200) throw new Error(`sign-up did not sign in (${me.status}): ${me.text}`);
  return { id: me.json.user.id, email, name, password, cookie: res.cookie };
}

/** Signs up and returns the session cookie ("castline.session=..."). */
export async function signUp(
  email: string,
  password: string,
  name = "Test Grower",
): Promise<string> {
  const res = await call(accountRoute.POST, {
    url: "/api/account",
    body: { name, email, password },
  });
  if (res.status !== 202 || !res.cookie)
    throw new Error(`sign-up failed (${res.status}): ${res.text}`);
  return res.cookie;
}

/** Signs in and returns the session cookie; throws when refused. */
export async function signIn(
  email: string,
  password: string,
  address = "198.51.100.1",
): Promise<string> {
  const res = await call(sessionRoute.POST, {
    url: "/api/session",
    body: { email, password },
    headers: { "x-forwarded-for": address },
  });
  if (res.status !== 200 || !res.cookie)
    throw new Error(`sign-in failed (${res.status}): ${res.text}`);
  return res.cookie;
}

/** A cookie for the user's current session version, as a sign-in would issue it (no argon2 cost). */
export async function cookieFor(user: { id: string }): Promise<string> {
  const dto = await getUserById({ userId: user.id });
  if (!dto) throw new Error(`no user ${user.id}`);
  return (await issueSessionCookie(dto)).split(";")[0]!;
}

export function gardenInput(overrides: Record<string, unknown> = {}) {
  // Invented demo values: a garden on Hollis Street with made-up frost dates.
  return {
    name: "Hollis Street Garden",
    timeZone: "America/Chicago",
    unitSystem: "us",
    lastSpringFrost: "04-15",
    firstFallFrost: "10-20",
    location: "Hollis Street, plot 3",
    ...overrides,
  };
}

export async function createGardenAs(cookie: string, overrides: Record<string, unknown> = {}) {
  const res = await call(gardensRoute.POST, {
    url: "/api/gardens",
    cookie,
    body: gardenInput(overrides),
  });
  if (res.status !== 201) throw new Error(`garden create failed (${res.status}): ${res.text}`);
  return res.json.garden as { id: string; name: string };
}

export interface GardenWorld {
  gardenId: string;
  gardenName: string;
  owner: TestUser;
  grower: TestUser;
  helper: TestUser;
  viewer: TestUser;
  /** A second viewer: the "someone else" when a test acts on another member. */
  bystander: TestUser;
  /** Owns another garden and is not a member of this one. */
  outsider: TestUser;
  outsiderGardenId: string;
}

/**
 * A garden with one member of each role plus an outsider who owns a garden of
 * their own. Pass `reuse` to put the same people in a fresh garden (no new
 * argon2 hashes). Members are written straight to memberships: invitations
 * have their own tests, and this keeps the harness working when mail is down.
 */
export async function makeGardenWithRoles(
  reuse?: GardenWorld,
  gardenName?: string,
): Promise<GardenWorld> {
  const people = reuse ?? {
    owner: await signUpUser("owner"),
    grower: await signUpUser("grower"),
    helper: await signUpUser("helper"),
    viewer: await signUpUser("viewer"),
    bystander: await signUpUser("bystander"),
    outsider: await signUpUser("outsider"),
  };
  const name = gardenName ?? `Hollis Street Garden ${++counter}`;
  const garden = await createGardenAs(await cookieFor(people.owner), { name });
  const outsiderGardenId =
    reuse?.outsiderGardenId ??
    (await createGardenAs(await cookieFor(people.outsider), { name: "Alder Lane Plot" })).id;
  const db = await getDb();
  const roleOf: [TestUser, Role][] = [
    [people.grower, "grower"],
    [people.helper, "helper"],
    [people.viewer, "viewer"],
    [people.bystander, "viewer"],
  ];
  await db
    .insert(memberships)
    .values(roleOf.map(([u, role]) => ({ gardenId: garden.id, userId: u.id, role })));
  return {
    gardenId: garden.id,
    gardenName: garden.name,
    owner: people.owner,
    grower: people.grower,
    helper: people.helper,
    viewer: people.viewer,
    bystander: people.bystander,
    outsider: people.outsider,
    outsiderGardenId,
  };
}

/** The error body every route returns; fails the test if the shape is different. */
export function errorCode(res: CallResult): string {
  const code = res.json?.error?.code;
  if (typeof code !== "string" || typeof res.json?.error?.message !== "string") {
    throw new Error(`not our error body (${res.status}): ${res.text}`);
  }
  return code;
}

export async function closeHarness(): Promise<void> {
  await closeDb();
  await stopLocalSmtpServer();
}
