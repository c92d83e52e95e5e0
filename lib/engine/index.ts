// The engine's public face: import from "@/lib/engine" rather than from its files.
export * from "@/lib/engine/types";
export * from "@/lib/engine/errors";
export * from "@/lib/engine/dates";
export * from "@/lib/engine/defaults";
export * from "@/lib/engine/geometry";
export * from "@/lib/engine/forecast";
export * from "@/lib/engine/population";
export * from "@/lib/engine/capacity";
export * from "@/lib/engine/liquid";
export * from "@/lib/engine/recurrence";
export * from "@/lib/engine/feeding-rules";
export * from "@/lib/engine/demand";
export * from "@/lib/engine/lots";
export * from "@/lib/engine/allocate";
export * from "@/lib/engine/balance-types";
export {
  computeBalance,
  DEFAULT_PRICE_PER_LB,
  DEFAULT_SHELF_LIFE_DAYS,
} from "@/lib/engine/balance";
export * from "@/lib/engine/gap-types";
export { closeGap, toProof } from "@/lib/engine/gap";
export * from "@/lib/engine/plan";
