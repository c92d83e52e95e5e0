import { eq } from "drizzle-orm";
import * as binEvents from "@/app/api/gardens/[gardenId]/bins/[binId]/events/route";
import * as bin from "@/app/api/gardens/[gardenId]/bins/[binId]/route";
import * as binsRoute from "@/app/api/gardens/[gardenId]/bins/route";
import * as lot from "@/app/api/gardens/[gardenId]/lots/[lotId]/route";
import * as lots from "@/app/api/gardens/[gardenId]/lots/route";
import * as photo from "@/app/api/gardens/[gardenId]/photos/[photoId]/route";
import * as photos from "@/app/api/gardens/[gardenId]/photos/route";
import { createPhoto } from "@/db/queries/photos";
import { getStorage } from "@/services/storage";
import { binBody, seedBin, seedBoughtLot } from "./bins";
import * as accountPassword from "@/app/api/account/password/route";
import * as account from "@/app/api/account/route";
import * as authJs from "@/app/api/auth/[...nextauth]/route";
import * as devOutbox from "@/app/api/dev/outbox/route";
import * as resend from "@/app/api/gardens/[gardenId]/invitations/[invitationId]/resend/route";
import * as invitation from "@/app/api/gardens/[gardenId]/invitations/[invitationId]/route";
import * as invitations from "@/app/api/gardens/[gardenId]/invitations/route";
import * as member from "@/app/api/gardens/[gardenId]/members/[userId]/route";
import * as members from "@/app/api/gardens/[gardenId]/members/route";
import * as balance from "@/app/api/gardens/[gardenId]/balance/route";
import * as gardenExport from "@/app/api/gardens/[gardenId]/export/route";
import * as bed from "@/app/api/gardens/[gardenId]/beds/[bedId]/route";
import * as beds from "@/app/api/gardens/[gardenId]/beds/route";
import * as bedsExport from "@/app/api/gardens/[gardenId]/beds/export/route";
import * as bedsImport from "@/app/api/gardens/[gardenId]/beds/import/route";
import * as crop from "@/app/api/gardens/[gardenId]/crops/[cropId]/route";
import * as crops from "@/app/api/gardens/[gardenId]/crops/route";
import * as planting from "@/app/api/gardens/[gardenId]/plantings/[plantingId]/route";
import * as plantings from "@/app/api/gardens/[gardenId]/plantings/route";
import * as garden from "@/app/api/gardens/[gardenId]/route";
import * as whatIf from "@/app/api/gardens/[gardenId]/what-if/route";
import * as gardenImport from "@/app/api/gardens/import/route";
import * as gardens from "@/app/api/gardens/route";
import * as health from "@/app/api/health/route";
import * as accept from "@/app/api/invitations/accept/route";
import * as resetConfirm from "@/app/api/password-reset/confirm/route";
import * as resetRequest from "@/app/api/password-reset/route";
import * as everywhere from "@/app/api/session/everywhere/route";
import * as session from "@/app/api/session/route";
import { getDb } from "@/db";
import { createInvitation } from "@/db/queries/invitations";
import { bins } from "@/db/schema";
import { createPasswordReset } from "@/db/queries/password-resets";
import { createLinkToken } from "@/lib/auth/tokens";
import { makeBed, makeOwnCrop, makePlanting, starterCropId } from "./beds-fixtures";
import {
  gardenInput,
  uniqueEmail,
  type CallOptions,
  type GardenWorld,
  type Handler,
  type TestUser,
} from "./harness";

// THE role matrix: every API route × every kind of caller → expected status.
// Later issues add their routes here; role-matrix.test.ts fails for any route
// file under app/api that has a handler missing from this table.

export const actors = ["signedOut", "viewer", "helper", "grower", "owner", "outsider"] as const;
export type Actor = (typeof actors)[number];

/** Order the matrix runs callers in: the owner last, so its (often destructive) success comes after the refusals. */
export const runOrder: Actor[] = ["signedOut", "outsider", "viewer", "helper", "grower", "owner"];

export interface RowContext {
  world: GardenWorld;
  actor: Actor;
  /** The acting person; for signedOut, the bystander (whose e-mail public routes use). */
  user: TestUser;
}

export interface MatrixRow {
  method: "GET" | "POST" | "PATCH" | "DELETE";
  /** Route file, relative to the repo root: the coverage check matches on it. */
  file: string;
  /** Which variant of the call, when one route appears more than once. */
  variant?: string;
  handler: Handler;
  /**
   * True when a 2xx answer must change the database (proves the snapshot can see a change);
   * a function when that depends on the caller (signing out changes nothing when signed out).
   */
  mutates: boolean | ((actor: Actor) => boolean);
  expect: Record<Actor, number>;
  /** Builds the call; may set up what it needs (an invitation, a reset token) first. */
  request: (
    ctx: RowContext,
  ) => Promise<Omit<CallOptions, "cookie" | "method">> | Omit<CallOptions, "cookie" | "method">;
}

// Expected answers, by the rule in lib/auth/require-role.ts: signed out → 401,
// not a member → 404 (another garden's ids reveal nothing), member below the
// needed role → 403.
const everyone = (ok: number) => ({
  signedOut: ok,
  viewer: ok,
  helper: ok,
  grower: ok,
  owner: ok,
  outsider: ok,
});
const signedIn = (ok: number) => ({
  signedOut: 401,
  viewer: ok,
  helper: ok,
  grower: ok,
  owner: ok,
  outsider: ok,
});
const viewerPlus = {
  signedOut: 401,
  viewer: 200,
  helper: 200,
  grower: 200,
  owner: 200,
  outsider: 404,
};
const ownerOnly = (ok: number) => ({
  signedOut: 401,
  viewer: 403,
  helper: 403,
  grower: 403,
  owner: ok,
  outsider: 404,
});

const atLeast = (minimum: "helper" | "grower", ok: number) => ({
  signedOut: 401,
  viewer: 403,
  helper: minimum === "helper" ? ok : 403,
  grower: ok,
  owner: ok,
  outsider: 404,
});

const g = (ctx: RowContext) => ({ gardenId: ctx.world.gardenId });
// The catch-all's params are a list of path segments.
const authPath = (path: string) =>
  ({ nextauth: path.split("/") }) as unknown as Record<string, string>;
const api = (ctx: RowContext, path: string) => `/api/gardens/${ctx.world.gardenId}/${path}`;

async function openInvitation(ctx: RowContext, email = uniqueEmail("invitee")) {
  const { token, tokenHash } = createLinkToken();
  const inv = await createInvitation({
    gardenId: ctx.world.gardenId,
    email,
    role: "viewer",
    tokenHash,
    invitedBy: ctx.world.owner.id,
  });
  return { token, invitationId: inv.id };
}

/** A bin in the world's garden for a what-if to change (made once; the matrix garden starts empty). */
async function aBin(ctx: RowContext): Promise<string> {
  const db = await getDb();
  const [existing] = await db
    .select({ id: bins.id })
    .from(bins)
    .where(eq(bins.gardenId, ctx.world.gardenId))
    .limit(1);
  if (existing) return existing.id;
  // 21 × 17 × 5½ in inside (PRODUCT.md's 24 × 20 in 2×6 tray), in metres.
  const [row] = await db
    .insert(bins)
    .values({
      gardenId: ctx.world.gardenId,
      name: "Matrix stack",
      trayLengthM: 0.5334,
      trayWidthM: 0.4318,
      trayDepthM: 0.1397,
      trayCount: 4,
      startedOn: "2026-02-01",
      startingWormCount: 1500,
    })
    .returning({ id: bins.id });
  return row!.id;
}

/** A small valid scenario file (an invented one-bin porch garden). */
const tinyScenario = {
  format: "castline-scenario",
  version: 1,
  garden: { name: "Matrix Porch" },
  settings: {
    unitSystem: "us",
    timeZone: "America/Chicago",
    lastSpringFrost: "04-15",
    firstFallFrost: "10-20",
  },
  bins: [],
  beds: [],
  plantings: [],
};

export const roleMatrix: MatrixRow[] = [
  {
    method: "GET",
    file: "app/api/health/route.ts",
    handler: health.GET,
    mutates: false,
    expect: everyone(200),
    request: () => ({ url: "/api/health" }),
  },
  {
    method: "GET",
    file: "app/api/dev/outbox/route.ts",
    handler: devOutbox.GET,
    mutates: false,
    // Only while mail is caught locally outside production (services/mailer.ts
    // isOutboxEnabled; these tests run with NODE_ENV=test), and only a signed-in
    // person's own mail (outbox-privacy.test.ts).
    expect: signedIn(200),
    request: () => ({ url: "/api/dev/outbox" }),
  },
  {
    method: "POST",
    file: "app/api/session/route.ts",
    variant: "sign in with own password",
    handler: session.POST,
    // A new row in the sessions allow-list.
    mutates: true,
    expect: everyone(200),
    request: ({ user }) => ({
      url: "/api/session",
      body: { email: user.email, password: user.password },
    }),
  },
  {
    method: "DELETE",
    file: "app/api/session/route.ts",
    handler: session.DELETE,
    // Deletes the caller's session row; a signed-out caller has none.
    mutates: (actor) => actor !== "signedOut",
    expect: everyone(200),
    request: () => ({ url: "/api/session" }),
  },
  {
    method: "POST",
    file: "app/api/session/everywhere/route.ts",
    handler: everywhere.POST,
    mutates: true,
    expect: signedIn(200),
    request: () => ({ url: "/api/session/everywhere" }),
  },
  {
    method: "GET",
    file: "app/api/account/route.ts",
    handler: account.GET,
    mutates: false,
    expect: signedIn(200),
    request: () => ({ url: "/api/account" }),
  },
  {
    method: "POST",
    file: "app/api/account/route.ts",
    variant: "sign up a new address",
    handler: account.POST,
    mutates: true,
    // 202 for a new and a known address alike (account-enumeration.test.ts).
    expect: everyone(202),
    request: () => ({
      url: "/api/account",
      body: {
        name: "New Grower",
        email: uniqueEmail("newcomer"),
        password: "a-fresh-bed-of-leaves",
      },
    }),
  },
  {
    method: "POST",
    file: "app/api/account/route.ts",
    variant: "sign up an address that has an account",
    handler: account.POST,
    // Nothing is made; the address's owner is e-mailed after the response.
    mutates: false,
    expect: everyone(202),
    request: ({ user }) => ({
      url: "/api/account",
      body: { name: "Someone Else", email: user.email, password: "a-fresh-bed-of-leaves" },
    }),
  },
  {
    method: "GET",
    file: "app/api/auth/[...nextauth]/route.ts",
    variant: "Auth.js session endpoint (switched off)",
    handler: authJs.GET as Handler,
    mutates: false,
    expect: everyone(404),
    request: () => ({ url: "/api/auth/session", params: authPath("session") }),
  },
  {
    method: "POST",
    file: "app/api/auth/[...nextauth]/route.ts",
    variant: "Auth.js credentials callback (switched off)",
    handler: authJs.POST as Handler,
    mutates: false,
    expect: everyone(404),
    request: ({ user }) => ({
      url: "/api/auth/callback/credentials",
      params: authPath("callback/credentials"),
      body: { email: user.email, password: user.password },
    }),
  },
  {
    method: "POST",
    file: "app/api/auth/[...nextauth]/route.ts",
    variant: "Auth.js sign-out (ends the session like DELETE /api/session)",
    handler: authJs.POST as Handler,
    mutates: (actor) => actor !== "signedOut",
    expect: everyone(200),
    request: () => ({ url: "/api/auth/signout", params: authPath("signout") }),
  },
  {
    method: "POST",
    file: "app/api/account/password/route.ts",
    variant: "to the same password (keeps the harness login valid)",
    handler: accountPassword.POST,
    mutates: true,
    expect: signedIn(200),
    request: ({ user }) => ({
      url: "/api/account/password",
      body: { currentPassword: user.password, newPassword: user.password },
    }),
  },
  {
    method: "POST",
    file: "app/api/password-reset/route.ts",
    variant: "for a known address",
    handler: resetRequest.POST,
    mutates: true,
    expect: everyone(202),
    request: ({ user }) => ({ url: "/api/password-reset", body: { email: user.email } }),
  },
  {
    method: "POST",
    file: "app/api/password-reset/confirm/route.ts",
    variant: "bystander's fresh token, same password",
    handler: resetConfirm.POST,
    mutates: true,
    expect: everyone(200),
    request: async ({ world }) => {
      const { token, tokenHash } = createLinkToken();
      await createPasswordReset({ userId: world.bystander.id, tokenHash });
      return {
        url: "/api/password-reset/confirm",
        body: { token, newPassword: world.bystander.password },
      };
    },
  },
  {
    method: "GET",
    file: "app/api/gardens/route.ts",
    handler: gardens.GET,
    mutates: false,
    expect: signedIn(200),
    request: () => ({ url: "/api/gardens" }),
  },
  {
    method: "POST",
    file: "app/api/gardens/route.ts",
    handler: gardens.POST,
    mutates: true,
    expect: signedIn(201),
    request: () => ({ url: "/api/gardens", body: gardenInput({ name: "Porch Containers" }) }),
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/route.ts",
    handler: garden.GET,
    mutates: false,
    expect: viewerPlus,
    request: (ctx) => ({ url: `/api/gardens/${ctx.world.gardenId}`, params: g(ctx) }),
  },
  {
    method: "PATCH",
    file: "app/api/gardens/[gardenId]/route.ts",
    handler: garden.PATCH,
    mutates: true,
    expect: ownerOnly(200),
    request: (ctx) => ({
      url: `/api/gardens/${ctx.world.gardenId}`,
      params: g(ctx),
      body: { location: "Hollis Street, plot 4 (moved)" },
    }),
  },
  {
    method: "DELETE",
    file: "app/api/gardens/[gardenId]/route.ts",
    variant: "with the exact name",
    handler: garden.DELETE,
    mutates: true,
    expect: ownerOnly(200),
    request: (ctx) => ({
      url: `/api/gardens/${ctx.world.gardenId}`,
      params: g(ctx),
      body: { confirmName: ctx.world.gardenName },
    }),
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/balance/route.ts",
    handler: balance.GET,
    mutates: false,
    expect: viewerPlus,
    request: (ctx) => ({
      url: `/api/gardens/${ctx.world.gardenId}/balance?months=6`,
      params: g(ctx),
    }),
  },
  {
    method: "POST",
    file: "app/api/gardens/[gardenId]/what-if/route.ts",
    handler: whatIf.POST,
    // A viewer may try what-ifs: nothing is written (the matrix checks the database is unchanged).
    mutates: false,
    expect: viewerPlus,
    request: async (ctx) => ({
      url: `/api/gardens/${ctx.world.gardenId}/what-if`,
      params: g(ctx),
      body: { months: 3, changes: [{ kind: "bin-trays", binId: await aBin(ctx), trays: 5 }] },
    }),
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/export/route.ts",
    handler: gardenExport.GET,
    mutates: false,
    expect: viewerPlus,
    request: (ctx) => ({ url: `/api/gardens/${ctx.world.gardenId}/export`, params: g(ctx) }),
  },
  {
    method: "POST",
    file: "app/api/gardens/import/route.ts",
    handler: gardenImport.POST,
    mutates: true,
    expect: signedIn(201),
    request: () => ({ url: "/api/gardens/import", body: tinyScenario }),
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/members/route.ts",
    handler: members.GET,
    mutates: false,
    expect: viewerPlus,
    request: (ctx) => ({ url: `/api/gardens/${ctx.world.gardenId}/members`, params: g(ctx) }),
  },
  {
    method: "PATCH",
    file: "app/api/gardens/[gardenId]/members/[userId]/route.ts",
    variant: "bystander's role → helper",
    handler: member.PATCH,
    mutates: true,
    expect: ownerOnly(200),
    request: (ctx) => ({
      url: `/api/gardens/${ctx.world.gardenId}/members/${ctx.world.bystander.id}`,
      params: { ...g(ctx), userId: ctx.world.bystander.id },
      body: { role: "helper" },
    }),
  },
  {
    method: "PATCH",
    file: "app/api/gardens/[gardenId]/members/[userId]/route.ts",
    variant: "own role → owner (self-promotion)",
    handler: member.PATCH,
    mutates: false,
    // The owner is already owner: the change is a no-op that still answers 200.
    expect: { signedOut: 401, viewer: 403, helper: 403, grower: 403, owner: 200, outsider: 404 },
    request: (ctx) => ({
      url: `/api/gardens/${ctx.world.gardenId}/members/${ctx.user.id}`,
      params: { ...g(ctx), userId: ctx.user.id },
      body: { role: "owner" },
    }),
  },
  {
    method: "DELETE",
    file: "app/api/gardens/[gardenId]/members/[userId]/route.ts",
    variant: "remove someone else (bystander)",
    handler: member.DELETE,
    mutates: true,
    expect: ownerOnly(200),
    request: (ctx) => ({
      url: `/api/gardens/${ctx.world.gardenId}/members/${ctx.world.bystander.id}`,
      params: { ...g(ctx), userId: ctx.world.bystander.id },
    }),
  },
  {
    method: "DELETE",
    file: "app/api/gardens/[gardenId]/members/[userId]/route.ts",
    variant: "leave (remove self)",
    handler: member.DELETE,
    mutates: true,
    // Any member may leave; the only owner may not (the garden would have none).
    expect: { signedOut: 401, viewer: 200, helper: 200, grower: 200, owner: 409, outsider: 404 },
    request: (ctx) => ({
      url: `/api/gardens/${ctx.world.gardenId}/members/${ctx.user.id}`,
      params: { ...g(ctx), userId: ctx.user.id },
    }),
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/invitations/route.ts",
    handler: invitations.GET,
    mutates: false,
    expect: ownerOnly(200),
    request: (ctx) => ({ url: `/api/gardens/${ctx.world.gardenId}/invitations`, params: g(ctx) }),
  },
  {
    method: "POST",
    file: "app/api/gardens/[gardenId]/invitations/route.ts",
    handler: invitations.POST,
    mutates: true,
    expect: ownerOnly(201),
    request: (ctx) => ({
      url: `/api/gardens/${ctx.world.gardenId}/invitations`,
      params: g(ctx),
      body: { email: uniqueEmail("invitee"), role: "helper" },
    }),
  },
  {
    method: "DELETE",
    file: "app/api/gardens/[gardenId]/invitations/[invitationId]/route.ts",
    handler: invitation.DELETE,
    mutates: true,
    expect: ownerOnly(200),
    request: async (ctx) => {
      const { invitationId } = await openInvitation(ctx);
      return {
        url: `/api/gardens/${ctx.world.gardenId}/invitations/${invitationId}`,
        params: { ...g(ctx), invitationId },
      };
    },
  },
  {
    method: "POST",
    file: "app/api/gardens/[gardenId]/invitations/[invitationId]/resend/route.ts",
    handler: resend.POST,
    mutates: true,
    expect: ownerOnly(200),
    request: async (ctx) => {
      const { invitationId } = await openInvitation(ctx);
      return {
        url: `/api/gardens/${ctx.world.gardenId}/invitations/${invitationId}/resend`,
        params: { ...g(ctx), invitationId },
      };
    },
  },
  {
    method: "POST",
    file: "app/api/invitations/accept/route.ts",
    variant: "a fresh invitation to this garden",
    handler: accept.POST,
    mutates: true,
    // Not role-gated: the invited address may accept once signed in (any role,
    // or none yet). Addressed to the caller; other addresses get 403 (invitations.test.ts).
    expect: signedIn(200),
    request: async (ctx) => {
      const { token } = await openInvitation(ctx, ctx.user.email);
      return { url: "/api/invitations/accept", body: { token } };
    },
  },

  // Beds, crops and plantings (issue 10): viewer and helper read, grower and owner write.
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/beds/route.ts",
    handler: beds.GET,
    mutates: false,
    expect: viewerPlus,
    request: (ctx) => ({ url: api(ctx, "beds?kind=bed&limit=10"), params: g(ctx) }),
  },
  {
    method: "POST",
    file: "app/api/gardens/[gardenId]/beds/route.ts",
    handler: beds.POST,
    mutates: true,
    expect: atLeast("grower", 201),
    request: (ctx) => ({
      url: api(ctx, "beds"),
      params: g(ctx),
      body: { name: "Porch pot", kind: "container", volume: { value: 5, unit: "gal" } },
    }),
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/beds/[bedId]/route.ts",
    handler: bed.GET,
    mutates: false,
    expect: viewerPlus,
    request: async (ctx) => {
      const { id } = await makeBed(ctx.world.gardenId);
      return { url: api(ctx, `beds/${id}`), params: { ...g(ctx), bedId: id } };
    },
  },
  {
    method: "PATCH",
    file: "app/api/gardens/[gardenId]/beds/[bedId]/route.ts",
    handler: bed.PATCH,
    mutates: true,
    expect: atLeast("grower", 200),
    request: async (ctx) => {
      const { id } = await makeBed(ctx.world.gardenId);
      return {
        url: api(ctx, `beds/${id}`),
        params: { ...g(ctx), bedId: id },
        body: { name: `Bed renamed by ${ctx.actor}`, width: { value: 3, unit: "ft" } },
      };
    },
  },
  {
    method: "DELETE",
    file: "app/api/gardens/[gardenId]/beds/[bedId]/route.ts",
    variant: "nothing logged",
    handler: bed.DELETE,
    mutates: true,
    expect: atLeast("grower", 200),
    request: async (ctx) => {
      const { id } = await makeBed(ctx.world.gardenId);
      return { url: api(ctx, `beds/${id}`), params: { ...g(ctx), bedId: id } };
    },
  },
  {
    method: "POST",
    file: "app/api/gardens/[gardenId]/beds/import/route.ts",
    handler: bedsImport.POST,
    mutates: true,
    expect: atLeast("grower", 201),
    request: async (ctx) => {
      await starterCropId("Tomato"); // the shared crop list, seeded once
      return {
        url: api(ctx, "beds/import"),
        params: g(ctx),
        body: {
          csv: [
            "Bed,Kind,Indoors,Length (ft),Width (ft),Depth (in),Volume (gal),Bed notes,Crop,Plants,Planted on,Expected end,Priority,Planting notes",
            `Imported by ${ctx.actor},bed,no,8,4,,,,Tomato,6,2027-05-01,,normal,`,
          ].join("\n"),
        },
      };
    },
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/beds/export/route.ts",
    handler: bedsExport.GET,
    mutates: false,
    expect: viewerPlus,
    request: (ctx) => ({ url: api(ctx, "beds/export"), params: g(ctx) }),
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/crops/route.ts",
    handler: crops.GET,
    mutates: false,
    expect: viewerPlus,
    request: (ctx) => ({ url: api(ctx, "crops?feederClass=heavy"), params: g(ctx) }),
  },
  {
    method: "POST",
    file: "app/api/gardens/[gardenId]/crops/route.ts",
    handler: crops.POST,
    mutates: true,
    expect: atLeast("grower", 201),
    request: (ctx) => ({
      url: api(ctx, "crops"),
      params: g(ctx),
      body: { name: `Ground cherry (${ctx.actor})`, feederClass: "medium" },
    }),
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/crops/[cropId]/route.ts",
    handler: crop.GET,
    mutates: false,
    expect: viewerPlus,
    request: async (ctx) => {
      const cropId = await starterCropId("Pepper");
      return { url: api(ctx, `crops/${cropId}`), params: { ...g(ctx), cropId } };
    },
  },
  {
    method: "PATCH",
    file: "app/api/gardens/[gardenId]/crops/[cropId]/route.ts",
    variant: "a starter crop (copied into the garden)",
    handler: crop.PATCH,
    mutates: true,
    expect: atLeast("grower", 200),
    request: async (ctx) => {
      const cropId = await starterCropId("Kale");
      return {
        url: api(ctx, `crops/${cropId}`),
        params: { ...g(ctx), cropId },
        body: { feederClass: ctx.actor === "owner" ? "light" : "heavy" },
      };
    },
  },
  {
    method: "DELETE",
    file: "app/api/gardens/[gardenId]/crops/[cropId]/route.ts",
    variant: "own crop, not planted",
    handler: crop.DELETE,
    mutates: true,
    expect: atLeast("grower", 200),
    request: async (ctx) => {
      const { id } = await makeOwnCrop(ctx.world.gardenId);
      return { url: api(ctx, `crops/${id}`), params: { ...g(ctx), cropId: id } };
    },
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/plantings/route.ts",
    handler: plantings.GET,
    mutates: false,
    expect: viewerPlus,
    request: (ctx) => ({ url: api(ctx, "plantings?active=true"), params: g(ctx) }),
  },
  {
    method: "POST",
    file: "app/api/gardens/[gardenId]/plantings/route.ts",
    variant: "quick entry",
    handler: plantings.POST,
    mutates: true,
    expect: atLeast("grower", 201),
    request: async (ctx) => {
      const { id } = await makeBed(ctx.world.gardenId);
      await starterCropId("Tomato");
      return {
        url: api(ctx, "plantings"),
        params: g(ctx),
        body: { bedId: id, plantedOn: "2026-05-01", quick: "6 tomato, 4 pepper" },
      };
    },
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/plantings/[plantingId]/route.ts",
    handler: planting.GET,
    mutates: false,
    expect: viewerPlus,
    request: async (ctx) => {
      const { id } = await makePlanting(ctx.world.gardenId);
      return { url: api(ctx, `plantings/${id}`), params: { ...g(ctx), plantingId: id } };
    },
  },
  {
    method: "PATCH",
    file: "app/api/gardens/[gardenId]/plantings/[plantingId]/route.ts",
    variant: "override the rule",
    handler: planting.PATCH,
    mutates: true,
    expect: atLeast("grower", 200),
    request: async (ctx) => {
      const { id } = await makePlanting(ctx.world.gardenId);
      return {
        url: api(ctx, `plantings/${id}`),
        params: { ...g(ctx), plantingId: id },
        body: {
          priority: "high",
          rule: {
            material: "tea",
            method: "drench",
            basis: "per-plant",
            amount: { value: 100, unit: "mL" },
            recurrence: "freq=weekly;interval=2",
          },
        },
      };
    },
  },
  {
    method: "DELETE",
    file: "app/api/gardens/[gardenId]/plantings/[plantingId]/route.ts",
    variant: "nothing logged",
    handler: planting.DELETE,
    mutates: true,
    expect: atLeast("grower", 200),
    request: async (ctx) => {
      const { id } = await makePlanting(ctx.world.gardenId);
      return { url: api(ctx, `plantings/${id}`), params: { ...g(ctx), plantingId: id } };
    },
  },

  // Issue 11: bins, the bin log and stock.
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/bins/route.ts",
    handler: binsRoute.GET,
    mutates: false,
    expect: viewerPlus,
    request: (ctx) => ({ url: `/api/gardens/${ctx.world.gardenId}/bins`, params: g(ctx) }),
  },
  {
    method: "POST",
    file: "app/api/gardens/[gardenId]/bins/route.ts",
    handler: binsRoute.POST,
    mutates: true,
    expect: atLeast("grower", 201),
    request: (ctx) => ({
      url: `/api/gardens/${ctx.world.gardenId}/bins`,
      params: g(ctx),
      body: binBody(),
    }),
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/bins/[binId]/route.ts",
    handler: bin.GET,
    mutates: false,
    expect: viewerPlus,
    request: async (ctx) => {
      const { id: binId } = await seedBin(ctx.world.gardenId);
      return {
        url: `/api/gardens/${ctx.world.gardenId}/bins/${binId}`,
        params: { ...g(ctx), binId },
      };
    },
  },
  {
    method: "PATCH",
    file: "app/api/gardens/[gardenId]/bins/[binId]/route.ts",
    handler: bin.PATCH,
    mutates: true,
    expect: atLeast("grower", 200),
    request: async (ctx) => {
      const { id: binId } = await seedBin(ctx.world.gardenId);
      return {
        url: `/api/gardens/${ctx.world.gardenId}/bins/${binId}`,
        params: { ...g(ctx), binId },
        body: { name: "Shed stack (renamed)", processingDays: 120 },
      };
    },
  },
  {
    method: "DELETE",
    file: "app/api/gardens/[gardenId]/bins/[binId]/route.ts",
    variant: "retire",
    handler: bin.DELETE,
    mutates: true,
    expect: atLeast("grower", 200),
    request: async (ctx) => {
      const { id: binId } = await seedBin(ctx.world.gardenId);
      return {
        url: `/api/gardens/${ctx.world.gardenId}/bins/${binId}`,
        params: { ...g(ctx), binId },
      };
    },
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/bins/[binId]/events/route.ts",
    handler: binEvents.GET,
    mutates: false,
    expect: viewerPlus,
    request: async (ctx) => {
      const { id: binId } = await seedBin(ctx.world.gardenId);
      return {
        url: `/api/gardens/${ctx.world.gardenId}/bins/${binId}/events?kind=observation`,
        params: { ...g(ctx), binId },
      };
    },
  },
  {
    method: "POST",
    file: "app/api/gardens/[gardenId]/bins/[binId]/events/route.ts",
    variant: "tray harvested (writes a lot too)",
    handler: binEvents.POST,
    mutates: true,
    expect: atLeast("helper", 201),
    request: async (ctx) => {
      const { id: binId } = await seedBin(ctx.world.gardenId);
      return {
        url: `/api/gardens/${ctx.world.gardenId}/bins/${binId}/events`,
        params: { ...g(ctx), binId },
        body: { kind: "tray-harvested", on: "2026-04-20", castingsKg: 18 },
      };
    },
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/lots/route.ts",
    handler: lots.GET,
    mutates: false,
    expect: viewerPlus,
    request: (ctx) => ({ url: `/api/gardens/${ctx.world.gardenId}/lots`, params: g(ctx) }),
  },
  {
    method: "POST",
    file: "app/api/gardens/[gardenId]/lots/route.ts",
    variant: "a bought bag",
    handler: lots.POST,
    mutates: true,
    expect: atLeast("grower", 201),
    request: (ctx) => ({
      url: `/api/gardens/${ctx.world.gardenId}/lots`,
      params: g(ctx),
      body: { reason: "bought", material: "castings", producedOn: "2026-11-01", amountSi: 9 },
    }),
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/lots/[lotId]/route.ts",
    handler: lot.GET,
    mutates: false,
    expect: viewerPlus,
    request: async (ctx) => {
      const { lotId } = await seedBoughtLot(ctx.world.gardenId);
      return {
        url: `/api/gardens/${ctx.world.gardenId}/lots/${lotId}`,
        params: { ...g(ctx), lotId },
      };
    },
  },
  {
    method: "PATCH",
    file: "app/api/gardens/[gardenId]/lots/[lotId]/route.ts",
    variant: "spilled part of a bought bag",
    handler: lot.PATCH,
    mutates: true,
    expect: atLeast("grower", 200),
    request: async (ctx) => {
      const { lotId } = await seedBoughtLot(ctx.world.gardenId);
      return {
        url: `/api/gardens/${ctx.world.gardenId}/lots/${lotId}`,
        params: { ...g(ctx), lotId },
        body: { reason: "spilled", removeSi: 1.5 },
      };
    },
  },
  {
    method: "POST",
    file: "app/api/gardens/[gardenId]/photos/route.ts",
    variant: "no file: the role gate answers before the body is read",
    handler: photos.POST,
    mutates: false,
    // Uploads themselves (multipart) are in photos.test.ts; here a JSON body is a 400 once past the gate.
    expect: atLeast("helper", 400),
    request: (ctx) => ({
      url: `/api/gardens/${ctx.world.gardenId}/photos`,
      params: g(ctx),
      body: { file: null },
    }),
  },
  {
    method: "GET",
    file: "app/api/gardens/[gardenId]/photos/[photoId]/route.ts",
    handler: photo.GET,
    mutates: false,
    expect: viewerPlus,
    request: async (ctx) => {
      const storageKey = `photos/${ctx.world.gardenId}/${crypto.randomUUID()}.jpg`;
      await (
        await getStorage()
      ).put(storageKey, Buffer.from([0xff, 0xd8, 0xff, 0xd9]), "image/jpeg");
      const { id: photoId } = await createPhoto({
        gardenId: ctx.world.gardenId,
        uploadedBy: ctx.world.owner.id,
        storageKey,
        byteSize: 4,
        originalName: "tray.jpg",
        eventId: null,
      });
      return {
        url: `/api/gardens/${ctx.world.gardenId}/photos/${photoId}`,
        params: { ...g(ctx), photoId },
      };
    },
  },
];

/** Route files deliberately outside the matrix, with the reason. */
export const matrixExclusions: Record<string, string> = {
  "app/api/[...path]/route.ts":
    "The JSON 404 for /api paths no route claims: the same answer for everyone (request-guards.test.ts).",
};
