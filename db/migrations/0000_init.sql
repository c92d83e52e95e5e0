CREATE TYPE "public"."amount_basis" AS ENUM('per-plant', 'per-area', 'per-container-volume', 'percent-of-mix');--> statement-breakpoint
CREATE TYPE "public"."bed_kind" AS ENUM('bed', 'container');--> statement-breakpoint
CREATE TYPE "public"."bin_event_kind" AS ENUM('feeding', 'tray-added', 'harvest', 'liquid-drained', 'worms-moved', 'observation');--> statement-breakpoint
CREATE TYPE "public"."bin_kind" AS ENUM('stacked-tray', 'single');--> statement-breakpoint
CREATE TYPE "public"."feeder_class" AS ENUM('heavy', 'medium', 'light');--> statement-breakpoint
CREATE TYPE "public"."mail_status" AS ENUM('pending', 'sent', 'failed');--> statement-breakpoint
CREATE TYPE "public"."material" AS ENUM('castings', 'leachate', 'tea');--> statement-breakpoint
CREATE TYPE "public"."feeding_method" AS ENUM('top-dress', 'side-dress', 'soil-mix', 'drench');--> statement-breakpoint
CREATE TYPE "public"."member_role" AS ENUM('viewer', 'helper', 'grower', 'owner');--> statement-breakpoint
CREATE TYPE "public"."si_unit" AS ENUM('kg', 'L');--> statement-breakpoint
CREATE TYPE "public"."stock_material" AS ENUM('castings', 'leachate');--> statement-breakpoint
CREATE TYPE "public"."unit_system" AS ENUM('us', 'metric');--> statement-breakpoint
CREATE TABLE "password_reset_tokens" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "password_reset_tokens_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "sign_in_attempts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"throttle_key" text NOT NULL,
	"succeeded" boolean NOT NULL,
	"attempted_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"password_hash" text NOT NULL,
	"session_version" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "users_email_unique" UNIQUE("email")
);
--> statement-breakpoint
CREATE TABLE "gardens" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"time_zone" text NOT NULL,
	"unit_system" "unit_system" DEFAULT 'us' NOT NULL,
	"last_spring_frost" date NOT NULL,
	"first_fall_frost" date NOT NULL,
	"location" text,
	"castings_price_per_kg" numeric(14, 6) DEFAULT 2.204623 NOT NULL,
	"currency" text DEFAULT 'USD' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "invitations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garden_id" uuid NOT NULL,
	"email" text NOT NULL,
	"role" "member_role" NOT NULL,
	"token_hash" text NOT NULL,
	"invited_by" uuid,
	"expires_at" timestamp with time zone NOT NULL,
	"accepted_at" timestamp with time zone,
	"accepted_by" uuid,
	"revoked_at" timestamp with time zone,
	"mail_status" "mail_status" DEFAULT 'pending' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "invitations_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "memberships" (
	"garden_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"role" "member_role" NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "memberships_garden_id_user_id_pk" PRIMARY KEY("garden_id","user_id")
);
--> statement-breakpoint
CREATE TABLE "beds" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garden_id" uuid NOT NULL,
	"name" text NOT NULL,
	"kind" "bed_kind" NOT NULL,
	"indoors" boolean DEFAULT false NOT NULL,
	"length_m" numeric(14, 6),
	"width_m" numeric(14, 6),
	"depth_m" numeric(14, 6),
	"container_volume_l" numeric(14, 6),
	"notes" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "crops" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garden_id" uuid,
	"name" text NOT NULL,
	"feeder_class" "feeder_class" NOT NULL,
	"edible_touches_soil" boolean DEFAULT false NOT NULL,
	"edible" boolean DEFAULT true NOT NULL,
	"feeding_rule_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "feeding_rules" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garden_id" uuid,
	"material" "material" NOT NULL,
	"method" "feeding_method" NOT NULL,
	"basis" "amount_basis" NOT NULL,
	"amount_si" numeric(14, 6) NOT NULL,
	"rrule" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "plantings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garden_id" uuid NOT NULL,
	"bed_id" uuid NOT NULL,
	"crop_id" uuid NOT NULL,
	"plant_count" integer DEFAULT 1 NOT NULL,
	"area_m2" numeric(14, 6),
	"planted_on" date NOT NULL,
	"expected_harvest_on" date,
	"ended_on" date,
	"priority" integer DEFAULT 3 NOT NULL,
	"feeding_rule_id" uuid,
	"notes" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "bin_events" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garden_id" uuid NOT NULL,
	"bin_id" uuid NOT NULL,
	"kind" "bin_event_kind" NOT NULL,
	"occurred_on" date NOT NULL,
	"food_kg" numeric(14, 6),
	"castings_kg" numeric(14, 6),
	"liquid_l" numeric(14, 6),
	"worm_count" integer,
	"target_bin_id" uuid,
	"temperature_c" numeric(14, 6),
	"moisture_percent" numeric(14, 6),
	"note" text,
	"logged_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "bins" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garden_id" uuid NOT NULL,
	"name" text NOT NULL,
	"kind" "bin_kind" DEFAULT 'stacked-tray' NOT NULL,
	"tray_length_m" numeric(14, 6) NOT NULL,
	"tray_width_m" numeric(14, 6) NOT NULL,
	"tray_depth_m" numeric(14, 6) NOT NULL,
	"tray_count" smallint NOT NULL,
	"started_on" date NOT NULL,
	"rotation_days" smallint DEFAULT 30 NOT NULL,
	"processing_days" smallint DEFAULT 90 NOT NULL,
	"fill_fraction" numeric(14, 6) DEFAULT 0.9 NOT NULL,
	"bulk_density_kg_per_l" numeric(14, 6) DEFAULT 0.7 NOT NULL,
	"dormant_months" smallint[] DEFAULT '{}' NOT NULL,
	"indoors" boolean DEFAULT true NOT NULL,
	"manure_feedstock" boolean DEFAULT false NOT NULL,
	"starting_worm_count" integer NOT NULL,
	"leachate_estimate_l_per_week" numeric(14, 6) DEFAULT 0.5 NOT NULL,
	"parent_bin_id" uuid,
	"retired_on" date,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "stock_lots" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garden_id" uuid NOT NULL,
	"bin_id" uuid,
	"source_event_id" uuid,
	"material" "stock_material" NOT NULL,
	"produced_on" date NOT NULL,
	"initial_amount_si" numeric(14, 6) NOT NULL,
	"remaining_amount_si" numeric(14, 6) NOT NULL,
	"si_unit" "si_unit" NOT NULL,
	"manure_feedstock" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "applications" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garden_id" uuid NOT NULL,
	"planting_id" uuid NOT NULL,
	"bed_id" uuid NOT NULL,
	"lot_id" uuid,
	"material" "material" NOT NULL,
	"method" "feeding_method" NOT NULL,
	"amount_si" numeric(14, 6) NOT NULL,
	"si_unit" "si_unit" NOT NULL,
	"applied_on" date NOT NULL,
	"planned_for" date,
	"logged_by" uuid,
	"note" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "feed_tokens" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garden_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"revoked_at" timestamp with time zone,
	"last_used_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "feed_tokens_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "reminder_preferences" (
	"garden_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"enabled" boolean DEFAULT false NOT NULL,
	"send_hour" smallint DEFAULT 7 NOT NULL,
	"days_ahead" smallint DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "reminder_preferences_garden_id_user_id_pk" PRIMARY KEY("garden_id","user_id")
);
--> statement-breakpoint
CREATE TABLE "sent_reminders" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garden_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"for_date" date NOT NULL,
	"kind" text NOT NULL,
	"message_id" text,
	"sent_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sent_reminders_once" UNIQUE("garden_id","user_id","for_date","kind")
);
--> statement-breakpoint
CREATE TABLE "uploads" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garden_id" uuid NOT NULL,
	"uploaded_by" uuid,
	"storage_key" text NOT NULL,
	"content_type" text NOT NULL,
	"byte_size" integer NOT NULL,
	"original_name" text NOT NULL,
	"attached_to_type" text,
	"attached_to_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "uploads_storage_key_unique" UNIQUE("storage_key")
);
--> statement-breakpoint
ALTER TABLE "password_reset_tokens" ADD CONSTRAINT "password_reset_tokens_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_invited_by_users_id_fk" FOREIGN KEY ("invited_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_accepted_by_users_id_fk" FOREIGN KEY ("accepted_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "beds" ADD CONSTRAINT "beds_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "crops" ADD CONSTRAINT "crops_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "crops" ADD CONSTRAINT "crops_feeding_rule_id_feeding_rules_id_fk" FOREIGN KEY ("feeding_rule_id") REFERENCES "public"."feeding_rules"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD CONSTRAINT "feeding_rules_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plantings" ADD CONSTRAINT "plantings_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plantings" ADD CONSTRAINT "plantings_bed_id_beds_id_fk" FOREIGN KEY ("bed_id") REFERENCES "public"."beds"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plantings" ADD CONSTRAINT "plantings_crop_id_crops_id_fk" FOREIGN KEY ("crop_id") REFERENCES "public"."crops"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plantings" ADD CONSTRAINT "plantings_feeding_rule_id_feeding_rules_id_fk" FOREIGN KEY ("feeding_rule_id") REFERENCES "public"."feeding_rules"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bin_events" ADD CONSTRAINT "bin_events_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bin_events" ADD CONSTRAINT "bin_events_bin_id_bins_id_fk" FOREIGN KEY ("bin_id") REFERENCES "public"."bins"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bin_events" ADD CONSTRAINT "bin_events_target_bin_id_bins_id_fk" FOREIGN KEY ("target_bin_id") REFERENCES "public"."bins"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bin_events" ADD CONSTRAINT "bin_events_logged_by_users_id_fk" FOREIGN KEY ("logged_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bins" ADD CONSTRAINT "bins_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bins" ADD CONSTRAINT "bins_parent_bin_id_bins_id_fk" FOREIGN KEY ("parent_bin_id") REFERENCES "public"."bins"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_lots" ADD CONSTRAINT "stock_lots_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_lots" ADD CONSTRAINT "stock_lots_bin_id_bins_id_fk" FOREIGN KEY ("bin_id") REFERENCES "public"."bins"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_lots" ADD CONSTRAINT "stock_lots_source_event_id_bin_events_id_fk" FOREIGN KEY ("source_event_id") REFERENCES "public"."bin_events"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "applications" ADD CONSTRAINT "applications_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "applications" ADD CONSTRAINT "applications_planting_id_plantings_id_fk" FOREIGN KEY ("planting_id") REFERENCES "public"."plantings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "applications" ADD CONSTRAINT "applications_bed_id_beds_id_fk" FOREIGN KEY ("bed_id") REFERENCES "public"."beds"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "applications" ADD CONSTRAINT "applications_lot_id_stock_lots_id_fk" FOREIGN KEY ("lot_id") REFERENCES "public"."stock_lots"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "applications" ADD CONSTRAINT "applications_logged_by_users_id_fk" FOREIGN KEY ("logged_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "feed_tokens" ADD CONSTRAINT "feed_tokens_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "feed_tokens" ADD CONSTRAINT "feed_tokens_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reminder_preferences" ADD CONSTRAINT "reminder_preferences_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reminder_preferences" ADD CONSTRAINT "reminder_preferences_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sent_reminders" ADD CONSTRAINT "sent_reminders_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sent_reminders" ADD CONSTRAINT "sent_reminders_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_uploaded_by_users_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "password_reset_tokens_user_idx" ON "password_reset_tokens" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "sign_in_attempts_key_time_idx" ON "sign_in_attempts" USING btree ("throttle_key","attempted_at");--> statement-breakpoint
CREATE INDEX "invitations_garden_idx" ON "invitations" USING btree ("garden_id");--> statement-breakpoint
CREATE INDEX "memberships_user_idx" ON "memberships" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "beds_garden_idx" ON "beds" USING btree ("garden_id");--> statement-breakpoint
CREATE INDEX "crops_garden_idx" ON "crops" USING btree ("garden_id");--> statement-breakpoint
CREATE INDEX "feeding_rules_garden_idx" ON "feeding_rules" USING btree ("garden_id");--> statement-breakpoint
CREATE INDEX "plantings_garden_idx" ON "plantings" USING btree ("garden_id");--> statement-breakpoint
CREATE INDEX "plantings_bed_idx" ON "plantings" USING btree ("bed_id");--> statement-breakpoint
CREATE INDEX "bin_events_garden_idx" ON "bin_events" USING btree ("garden_id");--> statement-breakpoint
CREATE INDEX "bin_events_bin_day_idx" ON "bin_events" USING btree ("bin_id","occurred_on");--> statement-breakpoint
CREATE INDEX "bins_garden_idx" ON "bins" USING btree ("garden_id");--> statement-breakpoint
CREATE INDEX "stock_lots_garden_idx" ON "stock_lots" USING btree ("garden_id");--> statement-breakpoint
CREATE INDEX "applications_garden_idx" ON "applications" USING btree ("garden_id");--> statement-breakpoint
CREATE INDEX "applications_planting_idx" ON "applications" USING btree ("planting_id");--> statement-breakpoint
CREATE INDEX "feed_tokens_garden_idx" ON "feed_tokens" USING btree ("garden_id");--> statement-breakpoint
CREATE INDEX "uploads_garden_idx" ON "uploads" USING btree ("garden_id");