CREATE TABLE "job_progress" (
	"job_id" uuid PRIMARY KEY NOT NULL,
	"queue" text NOT NULL,
	"kind" text NOT NULL,
	"entity_id" uuid NOT NULL,
	"state" text DEFAULT 'queued' NOT NULL,
	"share_done" double precision DEFAULT 0 NOT NULL,
	"eta_seconds" double precision,
	"message" text,
	"error" text,
	"attempt" integer DEFAULT 0 NOT NULL,
	"worker" text,
	"heartbeat_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"started_at" timestamp with time zone,
	"finished_at" timestamp with time zone,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "job_progress_share_done_range" CHECK ("job_progress"."share_done" >= 0 and "job_progress"."share_done" <= 1),
	CONSTRAINT "job_progress_state_known" CHECK ("job_progress"."state" in ('queued', 'running', 'retrying', 'completed', 'failed'))
);
--> statement-breakpoint
CREATE TABLE "plans" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"site_id" uuid NOT NULL,
	"battery_id" uuid NOT NULL,
	"price_profile_id" uuid NOT NULL,
	"load_profile_id" uuid,
	"generation_profile_id" uuid,
	"delivery_start" timestamp with time zone NOT NULL,
	"delivery_end" timestamp with time zone NOT NULL,
	"horizon_hours" double precision NOT NULL,
	"terminal_rule" text NOT NULL,
	"initial_soc_pct" double precision NOT NULL,
	"inputs" jsonb NOT NULL,
	"input_version" integer DEFAULT 1 NOT NULL,
	"status" text DEFAULT 'draft' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"submitted_by" text,
	"submitted_at" timestamp with time zone,
	"approved_by" text,
	"approved_at" timestamp with time zone,
	"approval_comment" text,
	"rejected_by" text,
	"rejected_at" timestamp with time zone,
	"rejection_comment" text,
	"superseded_at" timestamp with time zone,
	"superseded_by" uuid,
	"copied_from" uuid,
	"checksum" text,
	"job_id" uuid,
	"results" jsonb,
	"results_input_version" integer,
	"results_at" timestamp with time zone,
	"method" text,
	"error_message" text,
	CONSTRAINT "plans_status_known" CHECK ("plans"."status" in ('draft', 'submitted', 'approved', 'rejected', 'superseded')),
	CONSTRAINT "plans_window_order" CHECK ("plans"."delivery_end" > "plans"."delivery_start"),
	CONSTRAINT "plans_horizon_positive" CHECK ("plans"."horizon_hours" > 0 and "plans"."horizon_hours" <= 8784),
	CONSTRAINT "plans_terminal_rule_known" CHECK ("plans"."terminal_rule" ~ '^(free|cyclic|steady-value|target:[0-9]+(\.[0-9]+)?)$'),
	CONSTRAINT "plans_initial_soc_range" CHECK ("plans"."initial_soc_pct" >= 0 and "plans"."initial_soc_pct" <= 100),
	CONSTRAINT "plans_results_keyed" CHECK (("plans"."results" is null) = ("plans"."results_input_version" is null))
);
--> statement-breakpoint
CREATE TABLE "horizon_studies" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"site_id" uuid NOT NULL,
	"battery_id" uuid NOT NULL,
	"price_profile_id" uuid NOT NULL,
	"load_profile_id" uuid,
	"generation_profile_id" uuid,
	"period_start" timestamp with time zone NOT NULL,
	"period_end" timestamp with time zone NOT NULL,
	"horizons_hours" double precision[] NOT NULL,
	"replan_hours" double precision NOT NULL,
	"terminal_rules" text[] NOT NULL,
	"initial_soc_pct" double precision NOT NULL,
	"inputs" jsonb NOT NULL,
	"input_version" integer DEFAULT 1 NOT NULL,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"job_id" uuid,
	"results" jsonb,
	"results_input_version" integer,
	"results_at" timestamp with time zone,
	"method" text,
	"error_message" text,
	CONSTRAINT "horizon_studies_period_order" CHECK ("horizon_studies"."period_end" > "horizon_studies"."period_start"),
	CONSTRAINT "horizon_studies_replan_positive" CHECK ("horizon_studies"."replan_hours" > 0),
	CONSTRAINT "horizon_studies_has_runs" CHECK (cardinality("horizon_studies"."horizons_hours") > 0 and cardinality("horizon_studies"."terminal_rules") > 0),
	CONSTRAINT "horizon_studies_results_keyed" CHECK (("horizon_studies"."results" is null) = ("horizon_studies"."results_input_version" is null))
);
--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_battery_id_batteries_id_fk" FOREIGN KEY ("battery_id") REFERENCES "public"."batteries"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_price_profile_id_profiles_id_fk" FOREIGN KEY ("price_profile_id") REFERENCES "public"."profiles"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_load_profile_id_profiles_id_fk" FOREIGN KEY ("load_profile_id") REFERENCES "public"."profiles"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_generation_profile_id_profiles_id_fk" FOREIGN KEY ("generation_profile_id") REFERENCES "public"."profiles"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_superseded_by_plans_id_fk" FOREIGN KEY ("superseded_by") REFERENCES "public"."plans"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_copied_from_plans_id_fk" FOREIGN KEY ("copied_from") REFERENCES "public"."plans"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_job_id_job_progress_job_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."job_progress"("job_id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "horizon_studies" ADD CONSTRAINT "horizon_studies_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "horizon_studies" ADD CONSTRAINT "horizon_studies_battery_id_batteries_id_fk" FOREIGN KEY ("battery_id") REFERENCES "public"."batteries"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "horizon_studies" ADD CONSTRAINT "horizon_studies_price_profile_id_profiles_id_fk" FOREIGN KEY ("price_profile_id") REFERENCES "public"."profiles"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "horizon_studies" ADD CONSTRAINT "horizon_studies_load_profile_id_profiles_id_fk" FOREIGN KEY ("load_profile_id") REFERENCES "public"."profiles"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "horizon_studies" ADD CONSTRAINT "horizon_studies_generation_profile_id_profiles_id_fk" FOREIGN KEY ("generation_profile_id") REFERENCES "public"."profiles"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "horizon_studies" ADD CONSTRAINT "horizon_studies_job_id_job_progress_job_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."job_progress"("job_id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "job_progress_entity_idx" ON "job_progress" USING btree ("entity_id");--> statement-breakpoint
CREATE INDEX "job_progress_state_idx" ON "job_progress" USING btree ("state");--> statement-breakpoint
CREATE INDEX "plans_site_created_idx" ON "plans" USING btree ("site_id","created_at");--> statement-breakpoint
CREATE INDEX "plans_battery_window_idx" ON "plans" USING btree ("battery_id","delivery_start","delivery_end");--> statement-breakpoint
CREATE INDEX "plans_status_idx" ON "plans" USING btree ("status");--> statement-breakpoint
CREATE INDEX "horizon_studies_site_created_idx" ON "horizon_studies" USING btree ("site_id","created_at");