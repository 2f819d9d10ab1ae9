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
ALTER TABLE "option_studies" ADD CONSTRAINT "option_studies_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "option_studies" ADD CONSTRAINT "option_studies_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "option_studies" ADD CONSTRAINT "option_studies_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "option_studies" ADD CONSTRAINT "option_studies_estimate_id_estimates_id_fk" FOREIGN KEY ("estimate_id") REFERENCES "public"."estimates"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "option_studies" ADD CONSTRAINT "option_studies_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "option_studies_dealership_kind_created" ON "option_studies" USING btree ("dealership_id","kind","created_at","id");--> statement-breakpoint
CREATE INDEX "option_studies_machine" ON "option_studies" USING btree ("machine_id");--> statement-breakpoint
CREATE INDEX "option_studies_customer" ON "option_studies" USING btree ("customer_id");--> statement-breakpoint
CREATE INDEX "option_studies_series" ON "option_studies" USING btree ("series_id","version");