CREATE TABLE "idempotent_requests" (
	"user_id" text NOT NULL,
	"key" text NOT NULL,
	"route" text NOT NULL,
	"fingerprint" text NOT NULL,
	"state" text NOT NULL,
	"response_status" integer,
	"response_body" jsonb,
	"response_location" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	CONSTRAINT "idempotent_requests_user_id_key_route_pk" PRIMARY KEY("user_id","key","route"),
	CONSTRAINT "idempotent_requests_state_known" CHECK ("idempotent_requests"."state" in ('in_flight', 'done')),
	CONSTRAINT "idempotent_requests_done_has_status" CHECK ("idempotent_requests"."state" = 'in_flight' or "idempotent_requests"."response_status" is not null)
);
--> statement-breakpoint
ALTER TABLE "idempotent_requests" ADD CONSTRAINT "idempotent_requests_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;