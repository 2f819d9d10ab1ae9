-- An issued report version is what a customer read: refuse any change to it except marking it
-- superseded when a newer version is issued.
CREATE OR REPLACE FUNCTION report_versions_refuse_update() RETURNS trigger AS $$
BEGIN
  IF NEW.content IS DISTINCT FROM OLD.content
     OR NEW.logo IS DISTINCT FROM OLD.logo
     OR NEW.logo_mime IS DISTINCT FROM OLD.logo_mime
     OR NEW.version IS DISTINCT FROM OLD.version
     OR NEW.report_id IS DISTINCT FROM OLD.report_id
     OR NEW.dealership_id IS DISTINCT FROM OLD.dealership_id
     OR NEW.customer_id IS DISTINCT FROM OLD.customer_id
     OR NEW.engine_version IS DISTINCT FROM OLD.engine_version
     OR NEW.issued_by_id IS DISTINCT FROM OLD.issued_by_id
     OR NEW.issued_at IS DISTINCT FROM OLD.issued_at
     OR NEW.id IS DISTINCT FROM OLD.id
     OR (OLD.superseded_at IS NOT NULL AND NEW.superseded_at IS DISTINCT FROM OLD.superseded_at)
  THEN
    RAISE EXCEPTION 'report version % of report % is issued and cannot be changed; issue a new version instead', OLD.version, OLD.report_id
      USING ERRCODE = 'integrity_constraint_violation';
  END IF;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER report_versions_immutable
  BEFORE UPDATE ON report_versions
  FOR EACH ROW EXECUTE FUNCTION report_versions_refuse_update();
