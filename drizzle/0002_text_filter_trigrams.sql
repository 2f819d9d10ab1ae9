-- Trigram indexes for the lists' and the global search's "contains" text filters (ILIKE '%…%'),
-- which a b-tree cannot serve. pg_trgm ships with PostgreSQL and is a trusted extension, so the
-- database owner can create it without superuser rights.
CREATE EXTENSION IF NOT EXISTS pg_trgm;
--> statement-breakpoint
CREATE INDEX IF NOT EXISTS "customers_name_trgm" ON "customers" USING gin ("name" gin_trgm_ops);
--> statement-breakpoint
CREATE INDEX IF NOT EXISTS "customers_contact_name_trgm" ON "customers" USING gin ("contact_name" gin_trgm_ops);
--> statement-breakpoint
CREATE INDEX IF NOT EXISTS "sites_name_trgm" ON "sites" USING gin ("name" gin_trgm_ops);
--> statement-breakpoint
CREATE INDEX IF NOT EXISTS "machines_name_trgm" ON "machines" USING gin ("name" gin_trgm_ops);
--> statement-breakpoint
CREATE INDEX IF NOT EXISTS "machines_kind_trgm" ON "machines" USING gin ("kind" gin_trgm_ops);
--> statement-breakpoint
CREATE INDEX IF NOT EXISTS "estimates_title_trgm" ON "estimates" USING gin ("title" gin_trgm_ops);
--> statement-breakpoint
CREATE INDEX IF NOT EXISTS "estimates_machine_name_trgm" ON "estimates" USING gin ("machine_name" gin_trgm_ops);
--> statement-breakpoint
CREATE INDEX IF NOT EXISTS "duty_cycles_name_trgm" ON "duty_cycles" USING gin ("name" gin_trgm_ops);
