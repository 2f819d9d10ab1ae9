CREATE TYPE "public"."duty_cycle_source" AS ENUM('telematics', 'schedule', 'builder');--> statement-breakpoint
CREATE TYPE "public"."duty_cycle_status" AS ENUM('pending', 'processing', 'ready', 'failed');--> statement-breakpoint
CREATE TYPE "public"."membership_role" AS ENUM('dealer_admin', 'estimator', 'billing_admin', 'customer');--> statement-breakpoint
CREATE TYPE "public"."unit_system" AS ENUM('metric', 'imperial');--> statement-breakpoint
CREATE TABLE "duty_cycle_turns" (
	"id" bigint PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "duty_cycle_turns_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 9223372036854775807 START WITH 1 CACHE 1),
	"duty_cycle_id" uuid NOT NULL,
	"seq" integer NOT NULL,
	"radius" double precision,
	"steer_input" double precision,
	"heading_change" double precision NOT NULL,
	"speed" double precision NOT NULL,
	"per_hour" double precision NOT NULL,
	"surface" text NOT NULL,
	"load_state" text DEFAULT 'laden' NOT NULL,
	"reverse" integer DEFAULT 0 NOT NULL,
	"distance" double precision,
	"duration" double precision
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
	"version" integer DEFAULT 1 NOT NULL,
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
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
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
ALTER TABLE "duty_cycle_turns" ADD CONSTRAINT "duty_cycle_turns_duty_cycle_id_duty_cycles_id_fk" FOREIGN KEY ("duty_cycle_id") REFERENCES "public"."duty_cycles"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "duty_cycles" ADD CONSTRAINT "duty_cycles_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "duty_cycles" ADD CONSTRAINT "duty_cycles_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "duty_cycles" ADD CONSTRAINT "duty_cycles_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "duty_cycles" ADD CONSTRAINT "duty_cycles_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
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
CREATE INDEX "duty_cycle_turns_cycle_seq" ON "duty_cycle_turns" USING btree ("duty_cycle_id","seq");--> statement-breakpoint
CREATE INDEX "duty_cycles_dealership_created" ON "duty_cycles" USING btree ("dealership_id","created_at");--> statement-breakpoint
CREATE INDEX "duty_cycles_customer" ON "duty_cycles" USING btree ("customer_id");--> statement-breakpoint
CREATE UNIQUE INDEX "memberships_dealership_user_role" ON "memberships" USING btree ("dealership_id","user_id","role");--> statement-breakpoint
CREATE INDEX "memberships_user" ON "memberships" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "memberships_customer" ON "memberships" USING btree ("customer_id") WHERE "memberships"."customer_id" is not null;--> statement-breakpoint
CREATE INDEX "customers_dealership_name" ON "customers" USING btree ("dealership_id","name");--> statement-breakpoint
CREATE INDEX "customers_dealership_updated" ON "customers" USING btree ("dealership_id","updated_at");--> statement-breakpoint
CREATE INDEX "estimates_dealership_created" ON "estimates" USING btree ("dealership_id","created_at");--> statement-breakpoint
CREATE INDEX "estimates_customer_created" ON "estimates" USING btree ("customer_id","created_at");--> statement-breakpoint
CREATE INDEX "estimates_machine" ON "estimates" USING btree ("machine_id");--> statement-breakpoint
CREATE INDEX "estimates_duty_cycle" ON "estimates" USING btree ("duty_cycle_id");--> statement-breakpoint
CREATE INDEX "machines_dealership_name" ON "machines" USING btree ("dealership_id","name");--> statement-breakpoint
CREATE INDEX "machines_dealership_updated" ON "machines" USING btree ("dealership_id","updated_at");--> statement-breakpoint
CREATE INDEX "machines_customer" ON "machines" USING btree ("customer_id");--> statement-breakpoint
CREATE INDEX "sites_customer" ON "sites" USING btree ("customer_id");--> statement-breakpoint
CREATE INDEX "sites_dealership_name" ON "sites" USING btree ("dealership_id","name");