-- Quantities are float8 since 0002; 0003 added these four as numeric (hand-trimmed: the
-- generated file also restated the columns 0002 had already converted).
ALTER TABLE "crops" ALTER COLUMN "spacing_m" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "bin_events" ALTER COLUMN "castings_l" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "stock_adjustments" ALTER COLUMN "amount_si" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "stock_lots" ALTER COLUMN "price_per_kg" SET DATA TYPE double precision;
