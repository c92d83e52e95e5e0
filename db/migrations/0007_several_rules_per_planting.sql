-- Several feeding rules per planting and per crop: a rule now names its one
-- owner (planting_id or crop_id, each a composite key with garden_id) instead
-- of the owner pointing at one rule. Hand-written data step: every rule a
-- planting or crop held moves onto it as its first rule (position 0), one copy
-- per owner (a rule once shared by two owners becomes two rules); rules no one
-- held (and the shared starter list's, garden_id null: starter crops carried
-- none) are removed, so the new checks and NOT NULL hold.
-- tests/integration/migration-several-rules.test.ts runs it over old rows.
ALTER TABLE "crops" DROP CONSTRAINT "crops_starter_without_rule";--> statement-breakpoint
ALTER TABLE "crops" DROP CONSTRAINT "crops_rule_same_garden_fk";
--> statement-breakpoint
ALTER TABLE "plantings" DROP CONSTRAINT "plantings_rule_same_garden_fk";
--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD COLUMN "planting_id" uuid;--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD COLUMN "crop_id" uuid;--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD COLUMN "position" smallint;--> statement-breakpoint
INSERT INTO "feeding_rules" ("garden_id", "planting_id", "position", "material", "method", "basis",
    "amount_measure", "amount_si", "dilution_water_parts", "tea_castings_per_water", "rrule", "created_at")
  SELECT p."garden_id", p."id", 0, r."material", r."method", r."basis",
    r."amount_measure", r."amount_si", r."dilution_water_parts", r."tea_castings_per_water", r."rrule", r."created_at"
  FROM "plantings" p JOIN "feeding_rules" r ON r."garden_id" = p."garden_id" AND r."id" = p."feeding_rule_id";--> statement-breakpoint
INSERT INTO "feeding_rules" ("garden_id", "crop_id", "position", "material", "method", "basis",
    "amount_measure", "amount_si", "dilution_water_parts", "tea_castings_per_water", "rrule", "created_at")
  SELECT c."garden_id", c."id", 0, r."material", r."method", r."basis",
    r."amount_measure", r."amount_si", r."dilution_water_parts", r."tea_castings_per_water", r."rrule", r."created_at"
  FROM "crops" c JOIN "feeding_rules" r ON r."garden_id" = c."garden_id" AND r."id" = c."feeding_rule_id";--> statement-breakpoint
DELETE FROM "feeding_rules" WHERE "planting_id" IS NULL AND "crop_id" IS NULL;--> statement-breakpoint
ALTER TABLE "feeding_rules" ALTER COLUMN "garden_id" SET NOT NULL;--> statement-breakpoint
ALTER TABLE "feeding_rules" ALTER COLUMN "position" SET NOT NULL;--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD CONSTRAINT "feeding_rules_planting_same_garden_fk" FOREIGN KEY ("garden_id","planting_id") REFERENCES "public"."plantings"("garden_id","id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD CONSTRAINT "feeding_rules_crop_same_garden_fk" FOREIGN KEY ("garden_id","crop_id") REFERENCES "public"."crops"("garden_id","id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "crops" DROP COLUMN "feeding_rule_id";--> statement-breakpoint
ALTER TABLE "plantings" DROP COLUMN "feeding_rule_id";--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD CONSTRAINT "feeding_rules_planting_position" UNIQUE("planting_id","position");--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD CONSTRAINT "feeding_rules_crop_position" UNIQUE("crop_id","position");--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD CONSTRAINT "feeding_rules_one_owner" CHECK (num_nonnulls("feeding_rules"."planting_id", "feeding_rules"."crop_id") = 1);--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD CONSTRAINT "feeding_rules_position_non_negative" CHECK ("feeding_rules"."position" >= 0);
