CREATE TYPE "public"."billing_plan_kind" AS ENUM('trial', 'pack', 'monthly', 'annual');--> statement-breakpoint
CREATE TYPE "public"."billing_status" AS ENUM('none', 'trialing', 'active', 'past_due', 'cancelled', 'incomplete');--> statement-breakpoint
CREATE TABLE "billing_accounts" (
	"dealership_id" uuid PRIMARY KEY NOT NULL,
	"provider_customer_id" text,
	"billing_email" text,
	"status" "billing_status" DEFAULT 'none' NOT NULL,
	"plan_key" text,
	"provider_subscription_id" text,
	"current_period_start" timestamp with time zone,
	"current_period_end" timestamp with time zone,
	"cancel_at_period_end" boolean DEFAULT false NOT NULL,
	"trial_started_at" timestamp with time zone,
	"trial_ends_at" timestamp with time zone,
	"trial_ending_mail_sent_at" timestamp with time zone,
	"past_due_since" timestamp with time zone,
	"pack_credits" integer DEFAULT 0 NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "billing_accounts_providerCustomerId_unique" UNIQUE("provider_customer_id"),
	CONSTRAINT "billing_accounts_providerSubscriptionId_unique" UNIQUE("provider_subscription_id"),
	CONSTRAINT "billing_accounts_pack_credits" CHECK ("billing_accounts"."pack_credits" >= 0)
);
--> statement-breakpoint
CREATE TABLE "billing_mail_log" (
	"key" text PRIMARY KEY NOT NULL,
	"dealership_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"detail" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"sent_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "billing_pack_grants" (
	"checkout_session_id" text PRIMARY KEY NOT NULL,
	"dealership_id" uuid NOT NULL,
	"plan_key" text NOT NULL,
	"reports" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "billing_plans" (
	"key" text PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"kind" "billing_plan_kind" NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"currency" text NOT NULL,
	"price_minor" integer NOT NULL,
	"included_reports" integer NOT NULL,
	"overage_minor" integer,
	"trial_days" integer,
	"provider_price_id" text,
	"active" boolean DEFAULT true NOT NULL,
	"sort_order" integer DEFAULT 0 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "billing_webhook_events" (
	"event_id" text PRIMARY KEY NOT NULL,
	"type" text NOT NULL,
	"object_id" text,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL,
	"processed_at" timestamp with time zone,
	"error" text
);
--> statement-breakpoint
CREATE TABLE "report_allowance_uses" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid NOT NULL,
	"report_id" uuid NOT NULL,
	"plan_key" text,
	"source" text NOT NULL,
	"counted_at" timestamp with time zone DEFAULT now() NOT NULL,
	"overage_billed_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "option_studies" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid NOT NULL,
	"customer_id" uuid,
	"machine_id" uuid NOT NULL,
	"estimate_id" uuid,
	"kind" text NOT NULL,
	"series_id" uuid NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"title" text NOT NULL,
	"machine_name" text DEFAULT '' NOT NULL,
	"engine_version" text NOT NULL,
	"inputs" jsonb NOT NULL,
	"result" jsonb NOT NULL,
	"best_cost_per_hour" double precision,
	"current_cost_per_hour" double precision,
	"created_by_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "tread_reading_photos" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid NOT NULL,
	"reading_id" uuid NOT NULL,
	"content_type" text NOT NULL,
	"byte_size" integer NOT NULL,
	"bytes" "bytea" NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "tread_readings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid NOT NULL,
	"machine_id" uuid NOT NULL,
	"position" text NOT NULL,
	"kind" text DEFAULT 'reading' NOT NULL,
	"measured_on" date NOT NULL,
	"hour_meter" double precision NOT NULL,
	"depth_centre" double precision NOT NULL,
	"depth_inner" double precision,
	"depth_outer" double precision,
	"designation" text,
	"measured_by" text NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"created_by_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "dealership_brandings" (
	"dealership_id" uuid PRIMARY KEY NOT NULL,
	"display_name" text DEFAULT '' NOT NULL,
	"contact_line" text DEFAULT '' NOT NULL,
	"currency" text DEFAULT 'EUR' NOT NULL,
	"logo" "bytea",
	"logo_mime" text,
	"logo_width" integer,
	"logo_height" integer,
	"updated_by_id" text,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "report_messages" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"report_id" uuid NOT NULL,
	"dealership_id" uuid NOT NULL,
	"author_id" text,
	"author_name" text NOT NULL,
	"from_customer" boolean NOT NULL,
	"body" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "report_shares" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"report_id" uuid NOT NULL,
	"dealership_id" uuid NOT NULL,
	"customer_id" uuid NOT NULL,
	"email" text NOT NULL,
	"user_id" text,
	"invitation_id" uuid,
	"shared_by_id" text,
	"shared_at" timestamp with time zone DEFAULT now() NOT NULL,
	"withdrawn_at" timestamp with time zone,
	"first_opened_at" timestamp with time zone,
	"last_opened_at" timestamp with time zone,
	"open_count" integer DEFAULT 0 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "report_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"report_id" uuid NOT NULL,
	"dealership_id" uuid NOT NULL,
	"customer_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"content" jsonb NOT NULL,
	"logo" "bytea",
	"logo_mime" text,
	"engine_version" text NOT NULL,
	"issued_by_id" text,
	"issued_at" timestamp with time zone DEFAULT now() NOT NULL,
	"superseded_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "reports" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"dealership_id" uuid NOT NULL,
	"customer_id" uuid NOT NULL,
	"machine_id" uuid,
	"source_kind" text DEFAULT 'estimate' NOT NULL,
	"estimate_id" uuid,
	"comparison_id" uuid,
	"title" text NOT NULL,
	"recommendations" text DEFAULT '' NOT NULL,
	"customer_note" text DEFAULT '' NOT NULL,
	"latest_version" integer DEFAULT 0 NOT NULL,
	"customer_name" text DEFAULT '' NOT NULL,
	"machine_name" text DEFAULT '' NOT NULL,
	"created_by_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "duty_cycles" ADD COLUMN "heartbeat_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "duty_cycles" ADD COLUMN "interruptions" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "dealerships" ADD COLUMN "currency" text DEFAULT 'EUR' NOT NULL;--> statement-breakpoint
ALTER TABLE "billing_accounts" ADD CONSTRAINT "billing_accounts_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "billing_accounts" ADD CONSTRAINT "billing_accounts_plan_key_billing_plans_key_fk" FOREIGN KEY ("plan_key") REFERENCES "public"."billing_plans"("key") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "billing_mail_log" ADD CONSTRAINT "billing_mail_log_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "billing_pack_grants" ADD CONSTRAINT "billing_pack_grants_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "billing_pack_grants" ADD CONSTRAINT "billing_pack_grants_plan_key_billing_plans_key_fk" FOREIGN KEY ("plan_key") REFERENCES "public"."billing_plans"("key") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_allowance_uses" ADD CONSTRAINT "report_allowance_uses_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "option_studies" ADD CONSTRAINT "option_studies_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "option_studies" ADD CONSTRAINT "option_studies_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "option_studies" ADD CONSTRAINT "option_studies_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "option_studies" ADD CONSTRAINT "option_studies_estimate_id_estimates_id_fk" FOREIGN KEY ("estimate_id") REFERENCES "public"."estimates"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "option_studies" ADD CONSTRAINT "option_studies_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_reading_photos" ADD CONSTRAINT "tread_reading_photos_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_reading_photos" ADD CONSTRAINT "tread_reading_photos_reading_id_tread_readings_id_fk" FOREIGN KEY ("reading_id") REFERENCES "public"."tread_readings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_readings" ADD CONSTRAINT "tread_readings_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_readings" ADD CONSTRAINT "tread_readings_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_readings" ADD CONSTRAINT "tread_readings_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dealership_brandings" ADD CONSTRAINT "dealership_brandings_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dealership_brandings" ADD CONSTRAINT "dealership_brandings_updated_by_id_users_id_fk" FOREIGN KEY ("updated_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_messages" ADD CONSTRAINT "report_messages_report_id_reports_id_fk" FOREIGN KEY ("report_id") REFERENCES "public"."reports"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_messages" ADD CONSTRAINT "report_messages_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_messages" ADD CONSTRAINT "report_messages_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_shares" ADD CONSTRAINT "report_shares_report_id_reports_id_fk" FOREIGN KEY ("report_id") REFERENCES "public"."reports"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_shares" ADD CONSTRAINT "report_shares_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_shares" ADD CONSTRAINT "report_shares_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_shares" ADD CONSTRAINT "report_shares_invitation_id_invitations_id_fk" FOREIGN KEY ("invitation_id") REFERENCES "public"."invitations"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_shares" ADD CONSTRAINT "report_shares_shared_by_id_users_id_fk" FOREIGN KEY ("shared_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_versions" ADD CONSTRAINT "report_versions_report_id_reports_id_fk" FOREIGN KEY ("report_id") REFERENCES "public"."reports"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_versions" ADD CONSTRAINT "report_versions_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reports" ADD CONSTRAINT "reports_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reports" ADD CONSTRAINT "reports_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reports" ADD CONSTRAINT "reports_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reports" ADD CONSTRAINT "reports_estimate_id_estimates_id_fk" FOREIGN KEY ("estimate_id") REFERENCES "public"."estimates"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reports" ADD CONSTRAINT "reports_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "billing_webhook_events_unprocessed" ON "billing_webhook_events" USING btree ("received_at");--> statement-breakpoint
CREATE UNIQUE INDEX "report_allowance_uses_report" ON "report_allowance_uses" USING btree ("report_id");--> statement-breakpoint
CREATE INDEX "report_allowance_uses_counted" ON "report_allowance_uses" USING btree ("dealership_id","counted_at");--> statement-breakpoint
CREATE INDEX "option_studies_dealership_kind_created" ON "option_studies" USING btree ("dealership_id","kind","created_at","id");--> statement-breakpoint
CREATE INDEX "option_studies_machine" ON "option_studies" USING btree ("machine_id");--> statement-breakpoint
CREATE INDEX "option_studies_customer" ON "option_studies" USING btree ("customer_id");--> statement-breakpoint
CREATE INDEX "option_studies_series" ON "option_studies" USING btree ("series_id","version");--> statement-breakpoint
CREATE INDEX "tread_reading_photos_reading" ON "tread_reading_photos" USING btree ("reading_id");--> statement-breakpoint
CREATE INDEX "tread_readings_machine" ON "tread_readings" USING btree ("machine_id","position","hour_meter");--> statement-breakpoint
CREATE INDEX "tread_readings_dealership" ON "tread_readings" USING btree ("dealership_id","measured_on");--> statement-breakpoint
CREATE INDEX "report_messages_report" ON "report_messages" USING btree ("report_id","created_at");--> statement-breakpoint
CREATE INDEX "report_shares_report" ON "report_shares" USING btree ("report_id");--> statement-breakpoint
CREATE INDEX "report_shares_customer" ON "report_shares" USING btree ("customer_id");--> statement-breakpoint
CREATE UNIQUE INDEX "report_versions_report_version" ON "report_versions" USING btree ("report_id","version");--> statement-breakpoint
CREATE INDEX "report_versions_dealership_issued" ON "report_versions" USING btree ("dealership_id","issued_at");--> statement-breakpoint
CREATE INDEX "reports_dealership_updated" ON "reports" USING btree ("dealership_id","updated_at","id");--> statement-breakpoint
CREATE INDEX "reports_customer" ON "reports" USING btree ("customer_id");--> statement-breakpoint
CREATE INDEX "reports_estimate" ON "reports" USING btree ("estimate_id");--> statement-breakpoint
ALTER TABLE "dealerships" ADD CONSTRAINT "dealerships_currency_iso4217" CHECK ("dealerships"."currency" ~ '^[A-Z]{3}$');