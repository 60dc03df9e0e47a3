CREATE TABLE "api_tokens" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" text NOT NULL,
	"name" text NOT NULL,
	"secret_sha256" text NOT NULL,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"last_used_at" timestamp with time zone,
	"last_used_ip" text,
	"revoked_at" timestamp with time zone,
	"revoked_by" text,
	"revoked_reason" text,
	CONSTRAINT "api_tokens_secret_sha256_hex" CHECK ("api_tokens"."secret_sha256" ~ '^[0-9a-f]{64}$'),
	CONSTRAINT "api_tokens_expiry_after_creation" CHECK ("api_tokens"."expires_at" > "api_tokens"."created_at")
);
--> statement-breakpoint
ALTER TABLE "audit_events" ADD COLUMN "via" text;--> statement-breakpoint
ALTER TABLE "audit_events" ADD COLUMN "via_token_id" text;--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "kind" text DEFAULT 'person' NOT NULL;--> statement-breakpoint
ALTER TABLE "api_tokens" ADD CONSTRAINT "api_tokens_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "api_tokens_user_id_idx" ON "api_tokens" USING btree ("user_id");--> statement-breakpoint
ALTER TABLE "users" ADD CONSTRAINT "users_kind_known" CHECK ("users"."kind" in ('person', 'service'));--> statement-breakpoint
ALTER TABLE "users" ADD CONSTRAINT "users_service_has_no_password" CHECK ("users"."kind" = 'person' or "users"."password_hash" is null);