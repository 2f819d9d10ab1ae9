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
ALTER TABLE "billing_accounts" ADD CONSTRAINT "billing_accounts_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "billing_accounts" ADD CONSTRAINT "billing_accounts_plan_key_billing_plans_key_fk" FOREIGN KEY ("plan_key") REFERENCES "public"."billing_plans"("key") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "billing_mail_log" ADD CONSTRAINT "billing_mail_log_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "billing_pack_grants" ADD CONSTRAINT "billing_pack_grants_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "billing_pack_grants" ADD CONSTRAINT "billing_pack_grants_plan_key_billing_plans_key_fk" FOREIGN KEY ("plan_key") REFERENCES "public"."billing_plans"("key") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_allowance_uses" ADD CONSTRAINT "report_allowance_uses_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "billing_webhook_events_unprocessed" ON "billing_webhook_events" USING btree ("received_at");--> statement-breakpoint
CREATE UNIQUE INDEX "report_allowance_uses_report" ON "report_allowance_uses" USING btree ("report_id");--> statement-breakpoint
CREATE INDEX "report_allowance_uses_counted" ON "report_allowance_uses" USING btree ("dealership_id","counted_at");