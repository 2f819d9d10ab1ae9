-- Every new dealership starts on the active trial plan (seeded data), whichever path creates it.
CREATE OR REPLACE FUNCTION billing_start_trial() RETURNS trigger AS $$
BEGIN
  INSERT INTO billing_accounts (dealership_id, status, plan_key, trial_started_at, trial_ends_at)
  SELECT NEW.id, 'trialing', p.key, now(), now() + make_interval(days => p.trial_days)
  FROM billing_plans p
  WHERE p.kind = 'trial' AND p.active AND p.trial_days IS NOT NULL
  ORDER BY p.sort_order
  LIMIT 1
  ON CONFLICT (dealership_id) DO NOTHING;
  RETURN NEW;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER dealerships_start_trial AFTER INSERT ON dealerships
  FOR EACH ROW EXECUTE FUNCTION billing_start_trial();
