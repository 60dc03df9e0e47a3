-- Sign-off integrity in the database itself (SECURITY.md "Access control" and
-- "Data integrity"; ASVS 4.0.3 4.3.3 segregation of duties). The service checks
-- the same rules first and answers with clear messages; these are the last line.

-- Segregation of duties: whoever submitted a plan never approves or rejects it.
ALTER TABLE "plans" ADD CONSTRAINT "plans_approver_not_submitter"
  CHECK ("approved_by" IS NULL OR "approved_by" <> "submitted_by");
--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_rejecter_not_submitter"
  CHECK ("rejected_by" IS NULL OR "rejected_by" <> "submitted_by");
--> statement-breakpoint
-- A signed-off plan names its submitter and approver (so the check above cannot be
-- dodged with a NULL) and carries the SHA-256 checksum taken at approval.
ALTER TABLE "plans" ADD CONSTRAINT "plans_signed_off_complete"
  CHECK ("status" NOT IN ('approved', 'superseded') OR (
    "submitted_by" IS NOT NULL AND "approved_by" IS NOT NULL AND "approved_at" IS NOT NULL
    AND "results" IS NOT NULL AND "checksum" ~ '^[0-9a-f]{64}$'));
--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_superseded_complete"
  CHECK ("status" <> 'superseded' OR ("superseded_by" IS NOT NULL AND "superseded_at" IS NOT NULL));
--> statement-breakpoint
-- An approved plan never changes and is never deleted. The one change allowed is
-- approved -> superseded, made when a newer approved plan of the same battery with
-- an overlapping delivery window replaces it: that update may touch only status,
-- version, updated_at, superseded_at and superseded_by. A superseded plan is final.
-- The plan's series live in its `results` column, so they are covered too.
CREATE OR REPLACE FUNCTION slackwater_plans_signed_off_immutable() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  bookkeeping CONSTANT text[] := ARRAY['status', 'version', 'updated_at', 'superseded_at', 'superseded_by'];
BEGIN
  IF TG_OP = 'DELETE' THEN
    IF OLD.status IN ('approved', 'superseded') THEN
      RAISE EXCEPTION 'plan % is %: a signed-off plan cannot be deleted', OLD.id, OLD.status
        USING ERRCODE = 'integrity_constraint_violation';
    END IF;
    RETURN OLD;
  END IF;
  IF OLD.status = 'superseded' THEN
    RAISE EXCEPTION 'plan % is superseded: a signed-off plan cannot be changed', OLD.id
      USING ERRCODE = 'integrity_constraint_violation';
  END IF;
  IF OLD.status = 'approved' THEN
    IF NEW.status IS DISTINCT FROM 'superseded'
       OR NEW.version <= OLD.version
       OR (to_jsonb(NEW) - bookkeeping) IS DISTINCT FROM (to_jsonb(OLD) - bookkeeping) THEN
      RAISE EXCEPTION 'plan % is approved: a signed-off plan cannot be changed (it can only be superseded by a newer approved plan)', OLD.id
        USING ERRCODE = 'integrity_constraint_violation';
    END IF;
    IF NOT EXISTS (
      SELECT 1 FROM plans p
       WHERE p.id = NEW.superseded_by AND p.id <> OLD.id AND p.status = 'approved' AND p.battery_id = OLD.battery_id
         AND p.delivery_start < OLD.delivery_end AND p.delivery_end > OLD.delivery_start) THEN
      RAISE EXCEPTION 'plan % can be superseded only by an approved plan of the same battery whose delivery window overlaps it', OLD.id
        USING ERRCODE = 'integrity_constraint_violation';
    END IF;
  END IF;
  RETURN NEW;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER plans_signed_off_immutable
  BEFORE UPDATE OR DELETE ON plans
  FOR EACH ROW EXECUTE FUNCTION slackwater_plans_signed_off_immutable();
--> statement-breakpoint
-- TRUNCATE skips row triggers: refuse it while signed-off plans exist.
CREATE OR REPLACE FUNCTION slackwater_plans_refuse_truncate() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF EXISTS (SELECT 1 FROM plans WHERE status IN ('approved', 'superseded')) THEN
    RAISE EXCEPTION 'TRUNCATE on plans is not allowed: it holds signed-off plans'
      USING ERRCODE = 'integrity_constraint_violation';
  END IF;
  RETURN NULL;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER plans_no_truncate_signed_off
  BEFORE TRUNCATE ON plans
  FOR EACH STATEMENT EXECUTE FUNCTION slackwater_plans_refuse_truncate();
--> statement-breakpoint
-- The sign-off history is append-only, like the audit trail (function from 0001).
CREATE TRIGGER plan_events_append_only
  BEFORE UPDATE OR DELETE ON plan_events
  FOR EACH ROW EXECUTE FUNCTION slackwater_refuse_change();
--> statement-breakpoint
CREATE TRIGGER plan_events_no_truncate
  BEFORE TRUNCATE ON plan_events
  FOR EACH STATEMENT EXECUTE FUNCTION slackwater_refuse_change();
