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
ALTER TABLE "tread_reading_photos" ADD CONSTRAINT "tread_reading_photos_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_reading_photos" ADD CONSTRAINT "tread_reading_photos_reading_id_tread_readings_id_fk" FOREIGN KEY ("reading_id") REFERENCES "public"."tread_readings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_readings" ADD CONSTRAINT "tread_readings_dealership_id_dealerships_id_fk" FOREIGN KEY ("dealership_id") REFERENCES "public"."dealerships"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_readings" ADD CONSTRAINT "tread_readings_machine_id_machines_id_fk" FOREIGN KEY ("machine_id") REFERENCES "public"."machines"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tread_readings" ADD CONSTRAINT "tread_readings_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "tread_reading_photos_reading" ON "tread_reading_photos" USING btree ("reading_id");--> statement-breakpoint
CREATE INDEX "tread_readings_machine" ON "tread_readings" USING btree ("machine_id","position","hour_meter");--> statement-breakpoint
CREATE INDEX "tread_readings_dealership" ON "tread_readings" USING btree ("dealership_id","measured_on");