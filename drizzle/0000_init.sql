CREATE TYPE "public"."duty_cycle_source" AS ENUM('telematics', 'schedule', 'builder');--> statement-breakpoint
CREATE TYPE "public"."duty_cycle_status" AS ENUM('pending', 'processing', 'ready', 'failed');--> statement-breakpoint
CREATE TYPE "public"."membership_role" AS ENUM('dealer_admin', 'estimator', 'billing_admin', 'customer');--> statement-breakpoint
CREATE TYPE "public"."unit_system" AS ENUM('metric', 'imperial');--> statement-breakpoint
CREATE TABLE "accounts" (
	"user_id" text NOT NULL,
	"type" text NOT NULL,
	"provider" text NOT NULL,
	"provider_account_id" text NOT NULL,
	"refresh_token" text,
	"access_token" text,
	"expires_at" integer,
	"token_type" text,
	"scope" text,
	"id_token" text,
	"session_state" text,
	CONSTRAINT "accounts_provider_provider_account_id_pk" PRIMARY KEY("provider","provider_account_id")
);
--> statement-breakpoint
CREATE TABLE "audit_events" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid,
	"actor_user_id" text,
	"kind" text NOT NULL,
	"subject" text,
	"detail" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"ip" "inet",
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "captured_mails" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"from" text DEFAULT '' NOT NULL,
	"to" text[] NOT NULL,
	"subject" text DEFAULT '' NOT NULL,
	"text" text DEFAULT '' NOT NULL,
	"html" text,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "invitations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid NOT NULL,
	"email" text NOT NULL,
	"role" "membership_role" NOT NULL,
	"customer_id" uuid,
	"token_hash" text NOT NULL,
	"invited_by_id" text,
	"expires_at" timestamp with time zone NOT NULL,
	"accepted_at" timestamp with time zone,
	"revoked_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "invitations_tokenHash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "password_reset_tokens" (
	"token_hash" text PRIMARY KEY NOT NULL,
	"user_id" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "rate_limit_counters" (
	"key" text NOT NULL,
	"window_start" timestamp with time zone NOT NULL,
	"hits" integer DEFAULT 0 NOT NULL,
	CONSTRAINT "rate_limit_counters_key_window_start_pk" PRIMARY KEY("key","window_start")
);
--> statement-breakpoint
CREATE TABLE "sessions" (
	"session_token" text PRIMARY KEY NOT NULL,
	"user_id" text NOT NULL,
	"expires" timestamp with time zone NOT NULL
);
--> statement-breakpoint
CREATE TABLE "verification_tokens" (
	"identifier" text NOT NULL,
	"token" text NOT NULL,
	"expires" timestamp with time zone NOT NULL,
	CONSTRAINT "verification_tokens_identifier_token_pk" PRIMARY KEY("identifier","token")
);
--> statement-breakpoint
CREATE TABLE "duty_cycle_import_errors" (
	"id" bigint PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "duty_cycle_import_errors_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 9223372036854775807 START WITH 1 CACHE 1),
	"duty_cycle_id" uuid NOT NULL,
	"line" integer NOT NULL,
	"column" text NOT NULL,
	"reason" text NOT NULL,
	"value" text,
	"truncated" boolean DEFAULT false NOT NULL
);
--> statement-breakpoint
CREATE TABLE "duty_cycle_turns" (
	"id" bigint PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "duty_cycle_turns_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 9223372036854775807 START WITH 1 CACHE 1),
	"duty_cycle_id" uuid NOT NULL,
	"seq" integer NOT NULL,
	"label" text,
	"direction" text DEFAULT 'left' NOT NULL,
	"radius" double precision,
	"steer_input" double precision,
	"heading_change" double precision NOT NULL,
	"speed" double precision NOT NULL,
	"per_hour" double precision NOT NULL,
	"surface" text NOT NULL,
	"load_state" text DEFAULT 'laden' NOT NULL,
	"reverse" integer DEFAULT 0 NOT NULL,
	"distance" double precision,
	"duration" double precision,
	"start_time" double precision
);
--> statement-breakpoint
CREATE TABLE "duty_cycle_uploads" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid NOT NULL,
	"original_name" text NOT NULL,
	"storage_path" text NOT NULL,
	"sha256" text NOT NULL,
	"size_bytes" bigint NOT NULL,
	"content_type" text DEFAULT 'text/csv' NOT NULL,
	"uploaded_by_id" text,
	"uploaded_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "duty_cycles" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid NOT NULL,
	"customer_id" uuid NOT NULL,
	"machine_id" uuid,
	"name" text NOT NULL,
	"source" "duty_cycle_source" NOT NULL,
	"status" "duty_cycle_status" DEFAULT 'pending' NOT NULL,
	"failure_reason" text,
	"progress" double precision DEFAULT 0 NOT NULL,
	"operating_hours" double precision,
	"summary" jsonb,
	"straight" jsonb,
	"builder_input" jsonb,
	"upload_id" uuid,
	"mapping" jsonb,
	"rows_used" integer DEFAULT 0 NOT NULL,
	"rows_skipped" integer DEFAULT 0 NOT NULL,
	"job_id" text,
	"attempts" integer DEFAULT 0 NOT NULL,
	"processing_started_at" timestamp with time zone,
	"processed_at" timestamp with time zone,
	"version" integer DEFAULT 1 NOT NULL,
	"created_by_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "mapping_templates" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid NOT NULL,
	"name" text NOT NULL,
	"kind" text NOT NULL,
	"mapping" jsonb NOT NULL,
	"created_by_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "dealerships" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"slug" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "dealerships_slug_unique" UNIQUE("slug")
);
--> statement-breakpoint
CREATE TABLE "memberships" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid NOT NULL,
	"user_id" text NOT NULL,
	"role" "membership_role" NOT NULL,
	"customer_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "memberships_customer_has_record" CHECK (("memberships"."role" = 'customer') = ("memberships"."customer_id" is not null))
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" text PRIMARY KEY NOT NULL,
	"name" text,
	"email" text NOT NULL,
	"email_verified" timestamp with time zone,
	"image" text,
	"password_hash" text,
	"unit_system" "unit_system" DEFAULT 'metric' NOT NULL,
	"active_dealership_id" uuid,
	"sessions_valid_from" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "users_email_unique" UNIQUE("email")
);
--> statement-breakpoint
CREATE TABLE "customers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid NOT NULL,
	"name" text NOT NULL,
	"kind" text DEFAULT 'farm' NOT NULL,
	"contact_name" text,
	"contact_email" text,
	"contact_phone" text,
	"contacts" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "estimates" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid NOT NULL,
	"customer_id" uuid,
	"machine_id" uuid NOT NULL,
	"duty_cycle_id" uuid,
	"duty_cycle_version" integer DEFAULT 1 NOT NULL,
	"site_id" uuid,
	"title" text NOT NULL,
	"machine_name" text DEFAULT '' NOT NULL,
	"duty_cycle_name" text DEFAULT '' NOT NULL,
	"machine_version" integer NOT NULL,
	"engine_version" text NOT NULL,
	"inputs" jsonb NOT NULL,
	"result" jsonb NOT NULL,
	"cost_per_hour" double precision,
	"hours_to_first_replacement" double precision,
	"first_to_wear" text,
	"warning_count" integer DEFAULT 0 NOT NULL,
	"created_by_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "machines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid NOT NULL,
	"customer_id" uuid,
	"name" text NOT NULL,
	"kind" text NOT NULL,
	"layout" text DEFAULT 'ideal' NOT NULL,
	"spec" jsonb NOT NULL,
	"template_id" uuid,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sites" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid NOT NULL,
	"customer_id" uuid NOT NULL,
	"name" text NOT NULL,
	"surface_mix" jsonb NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "accounts" ADD CONSTRAINT "accounts_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_events" ADD CONSTRAINT "audit_events_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_events" ADD CONSTRAINT "audit_events_actor_user_id_users_id_fk" FOREIGN KEY ("actor_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_invited_by_id_users_id_fk" FOREIGN KEY ("invited_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "password_reset_tokens" ADD CONSTRAINT "password_reset_tokens_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sessions" ADD CONSTRAINT "sessions_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "duty_cycle_import_errors" ADD CONSTRAINT "duty_cycle_import_errors_duty_cycle_id_duty_cycles_id_fk" FOREIGN KEY ("duty_cycle_id") REFERENCES "public"."duty_cycles"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "duty_cycle_turns" ADD CONSTRAINT "duty_cycle_turns_duty_cycle_id_duty_cycles_id_fk" FOREIGN KEY ("duty_cycle_id") REFERENCES "public"."duty_cycles"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "duty_cycle_uploads" ADD CONSTRAINT "duty_cycle_uploads_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "duty_cycle_uploads" ADD CONSTRAINT "duty_cycle_uploads_uploaded_by_id_users_id_fk" FOREIGN KEY ("uploaded_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "duty_cycles" ADD CONSTRAINT "duty_cycles_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "duty_cycles" ADD CONSTRAINT "duty_cycles_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "duty_cycles" ADD CONSTRAINT "duty_cycles_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "duty_cycles" ADD CONSTRAINT "duty_cycles_upload_id_duty_cycle_uploads_id_fk" FOREIGN KEY ("upload_id") REFERENCES "public"."duty_cycle_uploads"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "duty_cycles" ADD CONSTRAINT "duty_cycles_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mapping_templates" ADD CONSTRAINT "mapping_templates_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mapping_templates" ADD CONSTRAINT "mapping_templates_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "users" ADD CONSTRAINT "users_active_dealership_id_dealerships_id_fk" FOREIGN KEY ("active_dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "customers" ADD CONSTRAINT "customers_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "machines" ADD CONSTRAINT "machines_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "machines" ADD CONSTRAINT "machines_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "machines" ADD CONSTRAINT "machines_template_id_machines_id_fk" FOREIGN KEY ("template_id") REFERENCES "public"."machines"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sites" ADD CONSTRAINT "sites_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sites" ADD CONSTRAINT "sites_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "audit_events_dealership_created" ON "audit_events" USING btree ("dealership_id","created_at");--> statement-breakpoint
CREATE INDEX "captured_mails_received" ON "captured_mails" USING btree ("received_at");--> statement-breakpoint
CREATE INDEX "invitations_dealership_created" ON "invitations" USING btree ("dealership_id","created_at");--> statement-breakpoint
CREATE INDEX "rate_limit_counters_window" ON "rate_limit_counters" USING btree ("window_start");--> statement-breakpoint
CREATE INDEX "duty_cycle_import_errors_cycle_line" ON "duty_cycle_import_errors" USING btree ("duty_cycle_id","line");--> statement-breakpoint
CREATE INDEX "duty_cycle_turns_cycle_seq" ON "duty_cycle_turns" USING btree ("duty_cycle_id","seq");--> statement-breakpoint
CREATE INDEX "duty_cycle_uploads_dealership" ON "duty_cycle_uploads" USING btree ("dealership_id","uploaded_at");--> statement-breakpoint
CREATE INDEX "duty_cycles_dealership_created" ON "duty_cycles" USING btree ("dealership_id","created_at");--> statement-breakpoint
CREATE INDEX "duty_cycles_customer" ON "duty_cycles" USING btree ("customer_id");--> statement-breakpoint
CREATE UNIQUE INDEX "mapping_templates_dealership_name" ON "mapping_templates" USING btree ("dealership_id","name");--> statement-breakpoint
CREATE UNIQUE INDEX "memberships_dealership_user_role" ON "memberships" USING btree ("dealership_id","user_id","role");--> statement-breakpoint
CREATE INDEX "memberships_user" ON "memberships" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "memberships_customer" ON "memberships" USING btree ("customer_id") WHERE "memberships"."customer_id" is not null;--> statement-breakpoint
CREATE INDEX "customers_dealership_name" ON "customers" USING btree ("dealership_id","name","id");--> statement-breakpoint
CREATE INDEX "customers_dealership_updated" ON "customers" USING btree ("dealership_id","updated_at","id");--> statement-breakpoint
CREATE INDEX "estimates_dealership_created" ON "estimates" USING btree ("dealership_id","created_at","id");--> statement-breakpoint
CREATE INDEX "estimates_customer_created" ON "estimates" USING btree ("customer_id","created_at");--> statement-breakpoint
CREATE INDEX "estimates_dealership_cost" ON "estimates" USING btree ("dealership_id","cost_per_hour","id");--> statement-breakpoint
CREATE INDEX "estimates_dealership_hours" ON "estimates" USING btree ("dealership_id","hours_to_first_replacement","id");--> statement-breakpoint
CREATE INDEX "estimates_machine" ON "estimates" USING btree ("machine_id");--> statement-breakpoint
CREATE INDEX "estimates_duty_cycle" ON "estimates" USING btree ("duty_cycle_id");--> statement-breakpoint
CREATE INDEX "machines_dealership_name" ON "machines" USING btree ("dealership_id","name","id");--> statement-breakpoint
CREATE INDEX "machines_dealership_updated" ON "machines" USING btree ("dealership_id","updated_at","id");--> statement-breakpoint
CREATE INDEX "machines_customer" ON "machines" USING btree ("customer_id");--> statement-breakpoint
CREATE INDEX "machines_dealership_layout" ON "machines" USING btree ("dealership_id","layout","name");--> statement-breakpoint
CREATE INDEX "sites_customer" ON "sites" USING btree ("customer_id");--> statement-breakpoint
CREATE INDEX "sites_dealership_name" ON "sites" USING btree ("dealership_id","name","id");