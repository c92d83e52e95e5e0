ALTER TABLE "gardens" ADD COLUMN "last_spring_frost_md" text;--> statement-breakpoint
ALTER TABLE "gardens" ADD COLUMN "first_fall_frost_md" text;--> statement-breakpoint
-- Hand-written data step: frost dates were stored with a year; keep their month and day.
UPDATE "gardens" SET "last_spring_frost_md" = to_char("last_spring_frost", 'MM-DD'), "first_fall_frost_md" = to_char("first_fall_frost", 'MM-DD');--> statement-breakpoint
ALTER TABLE "gardens" ALTER COLUMN "last_spring_frost_md" SET NOT NULL;--> statement-breakpoint
ALTER TABLE "gardens" ALTER COLUMN "first_fall_frost_md" SET NOT NULL;
