CREATE TYPE "public"."equipment_class" AS ENUM('class-1', 'class-2', 'live-chassis');--> statement-breakpoint
CREATE TYPE "public"."safety_verdict" AS ENUM('pass', 'fail');--> statement-breakpoint
CREATE TYPE "public"."specification" AS ENUM('original', 'modified');--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'safety-test';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'safety-override';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'soak-session';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'report-sent';--> statement-breakpoint
CREATE TABLE "report_sends" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"sent_by_id" integer,
	"recipients" text[] NOT NULL,
	"attachment_name" text NOT NULL,
	"page_count" integer NOT NULL,
	"sha256" text NOT NULL,
	"warnings" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"stage" text NOT NULL,
	"sent_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "safety_overrides" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"reason" text NOT NULL,
	"actor_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "safety_tests" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"equipment_class" "equipment_class" NOT NULL,
	"readings" jsonb NOT NULL,
	"lines" jsonb NOT NULL,
	"verdict" "safety_verdict" NOT NULL,
	"specification" "specification" NOT NULL,
	"modifications" text DEFAULT '' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"tested_by_id" integer,
	"tested_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "soak_sessions" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"started_at" timestamp with time zone DEFAULT now() NOT NULL,
	"ended_at" timestamp with time zone,
	"ambient_c" double precision,
	"chassis_c" double precision,
	"mains_current_text" text DEFAULT '' NOT NULL,
	"mains_current_amps" double precision,
	"faults" text DEFAULT '' NOT NULL,
	"action_taken" text DEFAULT '' NOT NULL,
	"finding_id" integer,
	"started_by_id" integer
);
--> statement-breakpoint
ALTER TABLE "report_sends" ADD CONSTRAINT "report_sends_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "report_sends" ADD CONSTRAINT "report_sends_sent_by_id_users_id_fk" FOREIGN KEY ("sent_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_overrides" ADD CONSTRAINT "safety_overrides_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_overrides" ADD CONSTRAINT "safety_overrides_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_tests" ADD CONSTRAINT "safety_tests_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "safety_tests" ADD CONSTRAINT "safety_tests_tested_by_id_users_id_fk" FOREIGN KEY ("tested_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "soak_sessions" ADD CONSTRAINT "soak_sessions_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "soak_sessions" ADD CONSTRAINT "soak_sessions_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "soak_sessions" ADD CONSTRAINT "soak_sessions_started_by_id_users_id_fk" FOREIGN KEY ("started_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "report_sends_restoration_id_idx" ON "report_sends" USING btree ("restoration_id");--> statement-breakpoint
CREATE INDEX "safety_overrides_restoration_id_idx" ON "safety_overrides" USING btree ("restoration_id");--> statement-breakpoint
CREATE INDEX "safety_tests_restoration_id_tested_at_idx" ON "safety_tests" USING btree ("restoration_id","tested_at");--> statement-breakpoint
CREATE INDEX "soak_sessions_restoration_id_idx" ON "soak_sessions" USING btree ("restoration_id");--> statement-breakpoint
CREATE UNIQUE INDEX "soak_sessions_restoration_id_running_idx" ON "soak_sessions" USING btree ("restoration_id") WHERE "soak_sessions"."ended_at" is null;