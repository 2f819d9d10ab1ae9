ALTER TABLE "duty_cycles" ADD COLUMN "heartbeat_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "duty_cycles" ADD COLUMN "interruptions" integer DEFAULT 0 NOT NULL;