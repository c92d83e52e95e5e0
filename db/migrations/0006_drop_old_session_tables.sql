DROP TABLE "ended_sessions" CASCADE;--> statement-breakpoint
DROP TABLE "sign_in_attempts" CASCADE;