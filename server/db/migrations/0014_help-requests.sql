ALTER TYPE "public"."event_kind" ADD VALUE 'help-requested';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'help-link-made';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'help-link-withdrawn';--> statement-breakpoint
CREATE TABLE "help_links" (
	"id" serial PRIMARY KEY NOT NULL,
	"help_request_id" integer NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"revoked_at" timestamp with time zone,
	"created_by_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "help_links_tokenHash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "help_replies" (
	"id" serial PRIMARY KEY NOT NULL,
	"help_request_id" integer NOT NULL,
	"link_id" integer,
	"name" text NOT NULL,
	"body" text NOT NULL,
	"approved_at" timestamp with time zone,
	"approved_by_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "help_requests" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"author_id" integer,
	"symptom" text NOT NULL,
	"include_set" boolean DEFAULT true NOT NULL,
	"include_valves" boolean DEFAULT true NOT NULL,
	"part_ids" integer[] DEFAULT '{}'::integer[] NOT NULL,
	"measurement_ids" integer[] DEFAULT '{}'::integer[] NOT NULL,
	"photo_ids" integer[] DEFAULT '{}'::integer[] NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "help_links" ADD CONSTRAINT "help_links_help_request_id_help_requests_id_fk" FOREIGN KEY ("help_request_id") REFERENCES "public"."help_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "help_links" ADD CONSTRAINT "help_links_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "help_replies" ADD CONSTRAINT "help_replies_help_request_id_help_requests_id_fk" FOREIGN KEY ("help_request_id") REFERENCES "public"."help_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "help_replies" ADD CONSTRAINT "help_replies_link_id_help_links_id_fk" FOREIGN KEY ("link_id") REFERENCES "public"."help_links"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "help_replies" ADD CONSTRAINT "help_replies_approved_by_id_users_id_fk" FOREIGN KEY ("approved_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "help_requests" ADD CONSTRAINT "help_requests_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "help_requests" ADD CONSTRAINT "help_requests_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "help_links_help_request_id_idx" ON "help_links" USING btree ("help_request_id");--> statement-breakpoint
CREATE INDEX "help_links_created_by_id_idx" ON "help_links" USING btree ("created_by_id");--> statement-breakpoint
CREATE INDEX "help_replies_help_request_id_idx" ON "help_replies" USING btree ("help_request_id");--> statement-breakpoint
CREATE INDEX "help_replies_link_id_idx" ON "help_replies" USING btree ("link_id");--> statement-breakpoint
CREATE INDEX "help_replies_approved_by_id_idx" ON "help_replies" USING btree ("approved_by_id");--> statement-breakpoint
CREATE INDEX "help_requests_restoration_id_idx" ON "help_requests" USING btree ("restoration_id");--> statement-breakpoint
CREATE INDEX "help_requests_author_id_idx" ON "help_requests" USING btree ("author_id");