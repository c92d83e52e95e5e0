import { count, eq } from "drizzle-orm";
import type { Db } from "@/db";
import {
  applications,
  beds,
  binEvents,
  bins,
  crops,
  gardens,
  memberships,
  plantings,
  stockLots,
  users,
} from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";
import {
  demoBeds,
  demoBins,
  demoGarden,
  demoHarvests,
  demoLogWindow,
  demoMembers,
  demoPlantings,
  demoWormMove,
  neighbourGarden,
} from "./demo-garden";
import { defaultRuleByClass, ensureStarterCrops } from "./starter-crops";

type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

function addDays(day: string, days: number): string {
  const d = new Date(`${day}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

function* eachDay(from: string, to: string, stepDays: number): Generator<string> {
  for (let day = from; day <= to; day = addDays(day, stepDays)) yield day;
}

/**
 * Loads the demo garden when the database has no gardens yet. Runs inside the
 * server process (never a second process on the data directory) and in one
 * transaction, so a crash mid-seed leaves nothing behind and the next start retries.
 */
export async function seedDemoGarden(db: Db): Promise<{ created: boolean }> {
  await ensureStarterCrops(db);
  // Hash outside the transaction: argon2 is slow and the transaction should be short.
  const hashes = await Promise.all(demoMembers.map((m) => hashPassword(m.password)));
  return db.transaction(async (tx) => {
    const [existing] = await tx.select({ n: count() }).from(gardens);
    if ((existing?.n ?? 0) > 0) return { created: false };

    const [garden] = await tx.insert(gardens).values(demoGarden).returning({ id: gardens.id });
    const gardenId = garden!.id;

    const userIds: Record<string, string> = {};
    for (const [i, member] of demoMembers.entries()) {
      const [user] = await tx
        .insert(users)
        .values({ email: member.email, name: member.name, passwordHash: hashes[i]! })
        .onConflictDoUpdate({ target: users.email, set: { name: member.name } })
        .returning({ id: users.id });
      userIds[member.role] = user!.id;
      await tx.insert(memberships).values({ gardenId, userId: user!.id, role: member.role });
    }

    const binIds = await insertBins(tx, gardenId);
    const bedIds = await insertBeds(tx, gardenId);
    const plantingRows = await insertPlantings(tx, gardenId, bedIds);
    const lots = await insertBinLogs(tx, gardenId, binIds, userIds.helper!);
    await insertApplications(tx, gardenId, plantingRows, lots, userIds.helper!);
    await insertNeighbourGarden(tx, userIds, hashes[0]!);
    return { created: true };
  });
}

async function insertNeighbourGarden(
  tx: Tx,
  userIds: Record<string, string>,
  passwordHash: string,
) {
  const { garden, owner, memberRoles, beds: plots } = neighbourGarden;
  const [row] = await tx.insert(gardens).values(garden).returning({ id: gardens.id });
  // Not a published demo account: it gets a hash nobody is told the password of.
  const [neighbour] = await tx
    .insert(users)
    .values({ ...owner, passwordHash: `${passwordHash}x` })
    .returning({ id: users.id });
  await tx.insert(memberships).values([
    { gardenId: row!.id, userId: neighbour!.id, role: "owner" },
    { gardenId: row!.id, userId: userIds.owner!, role: memberRoles.owner },
    { gardenId: row!.id, userId: userIds.grower!, role: memberRoles.grower },
  ]);
  await tx.insert(beds).values(plots.map((p) => ({ gardenId: row!.id, ...p })));
}

async function insertBins(tx: Tx, gardenId: string) {
  const [stack] = await tx
    .insert(bins)
    .values({ gardenId, ...demoBins.stack })
    .returning({ id: bins.id });
  const [tote] = await tx
    .insert(bins)
    .values({ gardenId, ...demoBins.tote, parentBinId: stack!.id })
    .returning({ id: bins.id });
  return { stack: stack!.id, tote: tote!.id } as Record<string, string>;
}

async function insertBeds(tx: Tx, gardenId: string) {
  const ids: Record<string, string> = {};
  for (const { key, ...bed } of demoBeds) {
    const [row] = await tx
      .insert(beds)
      .values({ gardenId, ...bed })
      .returning({ id: beds.id });
    ids[key] = row!.id;
  }
  return ids;
}

async function insertPlantings(tx: Tx, gardenId: string, bedIds: Record<string, string>) {
  const cropRows = await tx
    .select({ id: crops.id, name: crops.name, feederClass: crops.feederClass })
    .from(crops);
  const rows = [];
  for (const p of demoPlantings) {
    const crop = cropRows.find((c) => c.name === p.crop)!;
    const [row] = await tx
      .insert(plantings)
      .values({
        gardenId,
        bedId: bedIds[p.bed]!,
        cropId: crop.id,
        plantCount: p.count,
        plantedOn: p.plantedOn,
        expectedHarvestOn: p.expectedHarvestOn,
        endedOn: p.endedOn,
        priority: p.priority,
      })
      .returning({ id: plantings.id, bedId: plantings.bedId });
    rows.push({ ...row!, seed: p, feederClass: crop.feederClass });
  }
  return rows;
}

type Lot = { id: string; producedOn: string; remaining: number };

async function insertBinLogs(
  tx: Tx,
  gardenId: string,
  binIds: Record<string, string>,
  helperId: string,
) {
  const events: (typeof binEvents.$inferInsert)[] = [];
  const base = { gardenId, loggedBy: helperId };
  events.push({
    ...base,
    binId: binIds[demoWormMove.from]!,
    targetBinId: binIds[demoWormMove.to]!,
    kind: "worms-moved",
    occurredOn: demoWormMove.on,
    wormCount: demoWormMove.wormCount,
    note: "Split off to start the porch tote",
  });
  for (const day of eachDay(demoLogWindow.from, demoLogWindow.to, 7)) {
    events.push({
      ...base,
      binId: binIds.stack!,
      kind: "feeding",
      occurredOn: day,
      foodKg: 1.1,
      note: "Vegetable scraps, coffee grounds, shredded paper",
    });
    events.push({
      ...base,
      binId: binIds.tote!,
      kind: "feeding",
      occurredOn: addDays(day, 1),
      foodKg: 0.45,
    });
    events.push({
      ...base,
      binId: binIds.stack!,
      kind: "liquid-drained",
      occurredOn: addDays(day, 3),
      liquidL: 0.35,
    });
    events.push({
      ...base,
      binId: binIds.tote!,
      kind: "liquid-drained",
      occurredOn: addDays(day, 3),
      liquidL: 0.12,
    });
  }
  for (const day of eachDay(demoLogWindow.from, demoLogWindow.to, 14)) {
    events.push({
      ...base,
      binId: binIds.stack!,
      kind: "observation",
      occurredOn: addDays(day, 2),
      temperatureC: 17.5,
      moisturePercent: 78,
      note: "Bedding like a wrung sponge",
    });
  }
  for (const day of ["2026-09-06", "2026-10-06", "2026-11-05"]) {
    events.push({ ...base, binId: binIds.stack!, kind: "tray-added", occurredOn: day });
  }
  await tx.insert(binEvents).values(events);

  // Harvests become stock lots; an August lot is the stock carried into September.
  const lots: Lot[] = [];
  const carried = { bin: "stack", on: "2026-08-06", castingsKg: 18.2 };
  for (const h of [carried, ...demoHarvests]) {
    const [event] = await tx
      .insert(binEvents)
      .values({
        ...base,
        binId: binIds[h.bin]!,
        kind: "harvest",
        occurredOn: h.on,
        castingsKg: h.castingsKg,
      })
      .returning({ id: binEvents.id });
    const [lot] = await tx
      .insert(stockLots)
      .values({
        gardenId,
        binId: binIds[h.bin]!,
        sourceEventId: event!.id,
        material: "castings",
        producedOn: h.on,
        initialAmountSi: h.castingsKg,
        remainingAmountSi: h.castingsKg,
        siUnit: "kg",
        manureFeedstock: h.bin === "tote",
      })
      .returning({ id: stockLots.id });
    lots.push({ id: lot!.id, producedOn: h.on, remaining: h.castingsKg });
  }
  return lots;
}

async function insertApplications(
  tx: Tx,
  gardenId: string,
  rows: Awaited<ReturnType<typeof insertPlantings>>,
  lots: Lot[],
  helperId: string,
) {
  for (const day of ["2026-09-01", "2026-10-01", "2026-11-01"]) {
    for (const row of rows) {
      const p = row.seed;
      const active = p.plantedOn <= day && (!p.endedOn || p.endedOn >= day);
      const indoorBasil = p.bed === "pot-basil";
      const inSeason = day <= "2026-10-18" || indoorBasil;
      // Light feeders' default rule is every second month (September, November).
      const offMonth = row.feederClass === "light" && day === "2026-10-01";
      if (!active || !inSeason || offMonth) continue;
      const amount = defaultRuleByClass[row.feederClass].amountSi * p.count;
      // Oldest lot first, the same rule the plan uses.
      const lot = lots.find((l) => l.producedOn <= day && l.remaining >= amount);
      if (!lot) continue;
      lot.remaining -= amount;
      await tx.insert(applications).values({
        gardenId,
        plantingId: row.id,
        bedId: row.bedId,
        lotId: lot.id,
        material: "castings",
        method: "top-dress",
        amountSi: amount,
        siUnit: "kg",
        appliedOn: day,
        plannedFor: day,
        loggedBy: helperId,
      });
    }
  }
  for (const lot of lots) {
    await tx
      .update(stockLots)
      .set({ remainingAmountSi: lot.remaining })
      .where(eq(stockLots.id, lot.id));
  }
}
