CREATE TABLE "plan_events" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"plan_id" uuid NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	"action" text NOT NULL,
	"actor_id" text,
	"actor_name" text,
	"actor_email" text,
	"from_status" text,
	"to_status" text,
	"version" integer,
	"comment" text,
	"details" jsonb DEFAULT '{}'::jsonb NOT NULL,
	CONSTRAINT "plan_events_action_known" CHECK ("plan_events"."action" in ('submitted', 'approved', 'rejected', 'superseded', 'copied'))
);
--> statement-breakpoint
ALTER TABLE "plan_events" ADD CONSTRAINT "plan_events_plan_id_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."plans"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "plan_events_plan_idx" ON "plan_events" USING btree ("plan_id","id");