import { pgEnum } from "drizzle-orm/pg-core";

export const roleEnum = pgEnum("member_role", ["viewer", "helper", "grower", "owner"]);
export const unitSystemEnum = pgEnum("unit_system", ["us", "metric"]);
export const bedKindEnum = pgEnum("bed_kind", ["bed", "container"]);
export const feederClassEnum = pgEnum("feeder_class", ["heavy", "medium", "light"]);
export const materialEnum = pgEnum("material", ["castings", "leachate", "tea"]);
export const methodEnum = pgEnum("feeding_method", [
  "top-dress",
  "side-dress",
  "soil-mix",
  "drench",
]);
export const basisEnum = pgEnum("amount_basis", [
  "per-plant",
  "per-area",
  "per-container-volume",
  "percent-of-mix",
]);
// What a feeding rule's amount measures per basis unit.
export const amountMeasureEnum = pgEnum("amount_measure", ["mass", "volume", "percent-of-mix"]);
export const binKindEnum = pgEnum("bin_kind", ["stacked-tray", "single", "flow-through"]);
export const binEventKindEnum = pgEnum("bin_event_kind", [
  "feeding",
  "bedding-added",
  "tray-added",
  "harvest",
  "liquid-drained",
  "worms-moved",
  "observation",
]);
export const stockMaterialEnum = pgEnum("stock_material", ["castings", "leachate"]);
export const mailStatusEnum = pgEnum("mail_status", ["pending", "sent", "failed"]);
// Why a lot was changed by hand rather than by a feeding.
export const stockAdjustmentReasonEnum = pgEnum("stock_adjustment_reason", [
  "spilled",
  "given-away",
  "spoiled",
  "correction",
]);
