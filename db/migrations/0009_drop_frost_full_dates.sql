ALTER TABLE "gardens" DROP COLUMN "last_spring_frost";--> statement-breakpoint
ALTER TABLE "gardens" DROP COLUMN "first_fall_frost";