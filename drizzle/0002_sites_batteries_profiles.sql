CREATE TABLE "sites" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"timezone" text NOT NULL,
	"import_limit_kw" double precision,
	"export_limit_kw" double precision,
	"demand_charge_per_kw" double precision,
	"currency" text DEFAULT 'EUR' NOT NULL,
	"default_horizon_hours" integer,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sites_limits_non_negative" CHECK (coalesce("sites"."import_limit_kw", 0) >= 0 and coalesce("sites"."export_limit_kw", 0) >= 0),
	CONSTRAINT "sites_demand_charge_non_negative" CHECK (coalesce("sites"."demand_charge_per_kw", 0) >= 0),
	CONSTRAINT "sites_currency_iso" CHECK ("sites"."currency" ~ '^[A-Z]{3}$'),
	CONSTRAINT "sites_horizon_range" CHECK ("sites"."default_horizon_hours" is null or "sites"."default_horizon_hours" between 1 and 8784)
);
--> statement-breakpoint
CREATE TABLE "batteries" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"site_id" uuid NOT NULL,
	"name" text NOT NULL,
	"power_charge_kw" double precision NOT NULL,
	"power_discharge_kw" double precision NOT NULL,
	"energy_kwh" double precision NOT NULL,
	"soc_min_pct" double precision NOT NULL,
	"soc_max_pct" double precision NOT NULL,
	"soc_initial_pct" double precision NOT NULL,
	"efficiency_charge" double precision NOT NULL,
	"efficiency_discharge" double precision NOT NULL,
	"self_discharge_pct_per_hour" double precision NOT NULL,
	"degradation_cost_per_mwh" double precision NOT NULL,
	"max_cycles_per_day" double precision,
	"version" integer DEFAULT 1 NOT NULL,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "batteries_power_positive" CHECK ("batteries"."power_charge_kw" > 0 and "batteries"."power_discharge_kw" > 0 and "batteries"."energy_kwh" > 0),
	CONSTRAINT "batteries_soc_window" CHECK (0 <= "batteries"."soc_min_pct" and "batteries"."soc_min_pct" < "batteries"."soc_max_pct" and "batteries"."soc_max_pct" <= 100 and "batteries"."soc_initial_pct" between "batteries"."soc_min_pct" and "batteries"."soc_max_pct"),
	CONSTRAINT "batteries_efficiency_range" CHECK ("batteries"."efficiency_charge" > 0 and "batteries"."efficiency_charge" <= 1 and "batteries"."efficiency_discharge" > 0 and "batteries"."efficiency_discharge" <= 1),
	CONSTRAINT "batteries_costs_non_negative" CHECK ("batteries"."self_discharge_pct_per_hour" >= 0 and "batteries"."self_discharge_pct_per_hour" < 100 and "batteries"."degradation_cost_per_mwh" >= 0),
	CONSTRAINT "batteries_cycles_positive" CHECK ("batteries"."max_cycles_per_day" is null or "batteries"."max_cycles_per_day" > 0)
);
--> statement-breakpoint
CREATE TABLE "profiles" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"site_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"name" text NOT NULL,
	"unit" text NOT NULL,
	"source_unit" text NOT NULL,
	"interval_ending" boolean DEFAULT false NOT NULL,
	"start_at" timestamp with time zone NOT NULL,
	"step_minutes" integer NOT NULL,
	"value_count" integer NOT NULL,
	"values" double precision[] NOT NULL,
	"filled_indexes" integer[] DEFAULT '{}'::integer[] NOT NULL,
	"min_value" double precision NOT NULL,
	"max_value" double precision NOT NULL,
	"mean_value" double precision NOT NULL,
	"notes" text[] DEFAULT '{}'::text[] NOT NULL,
	"original_file" "bytea" NOT NULL,
	"original_filename" text NOT NULL,
	"original_sha256" text NOT NULL,
	"uploaded_by" text NOT NULL,
	"uploaded_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "profiles_kind_known" CHECK ("profiles"."kind" in ('price', 'load', 'generation')),
	CONSTRAINT "profiles_step_supported" CHECK ("profiles"."step_minutes" in (5, 15, 30, 60)),
	CONSTRAINT "profiles_value_count" CHECK ("profiles"."value_count" > 0 and cardinality("profiles"."values") = "profiles"."value_count"),
	CONSTRAINT "profiles_sha256_hex" CHECK ("profiles"."original_sha256" ~ '^[0-9a-f]{64}$')
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" text PRIMARY KEY NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"role" text NOT NULL,
	"disabled" boolean DEFAULT false NOT NULL,
	"password_hash" text,
	"password_changed_at" timestamp with time zone,
	"last_sign_in_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "users_email_unique" UNIQUE("email"),
	CONSTRAINT "users_email_lower_case" CHECK ("users"."email" = lower("users"."email")),
	CONSTRAINT "users_role_known" CHECK ("users"."role" in ('admin', 'planner', 'approver', 'viewer'))
);
--> statement-breakpoint
CREATE TABLE "auth_attempts" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	"kind" text NOT NULL,
	"email" text NOT NULL,
	"ip" text NOT NULL,
	"success" boolean NOT NULL
);
--> statement-breakpoint
CREATE TABLE "one_time_tokens" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"user_id" text NOT NULL,
	"purpose" text NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "one_time_tokens_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "sessions" (
	"id" text PRIMARY KEY NOT NULL,
	"user_id" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "mail_outbox" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"message_id" text,
	"from" text NOT NULL,
	"to" text NOT NULL,
	"subject" text NOT NULL,
	"text" text NOT NULL,
	"html" text,
	"sent_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "batteries" ADD CONSTRAINT "batteries_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "profiles" ADD CONSTRAINT "profiles_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "one_time_tokens" ADD CONSTRAINT "one_time_tokens_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sessions" ADD CONSTRAINT "sessions_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "sites_name_unique" ON "sites" USING btree (lower("name"));--> statement-breakpoint
CREATE UNIQUE INDEX "batteries_site_name_unique" ON "batteries" USING btree ("site_id",lower("name"));--> statement-breakpoint
CREATE INDEX "profiles_site_kind_idx" ON "profiles" USING btree ("site_id","kind");--> statement-breakpoint
CREATE INDEX "auth_attempts_email_idx" ON "auth_attempts" USING btree ("email","at");--> statement-breakpoint
CREATE INDEX "auth_attempts_ip_idx" ON "auth_attempts" USING btree ("ip","at");--> statement-breakpoint
CREATE INDEX "one_time_tokens_user_id_idx" ON "one_time_tokens" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "sessions_user_id_idx" ON "sessions" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "mail_outbox_to_idx" ON "mail_outbox" USING btree ("to");--> statement-breakpoint
CREATE INDEX "mail_outbox_sent_at_idx" ON "mail_outbox" USING btree ("sent_at");