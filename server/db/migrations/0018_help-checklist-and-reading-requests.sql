CREATE TYPE "public"."cause_result" AS ENUM('ruled-out', 'confirmed', 'inconclusive');--> statement-breakpoint
CREATE TYPE "public"."reading_request_kind" AS ENUM('reading', 'photo', 'note');--> statement-breakpoint
ALTER TYPE "public"."notification_kind" ADD VALUE 'help-request';--> statement-breakpoint
ALTER TYPE "public"."notification_kind" ADD VALUE 'reading-requested';--> statement-breakpoint
ALTER TYPE "public"."notification_kind" ADD VALUE 'reading-answered';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'cause-checked' BEFORE 'estimate-sent';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'reading-requested' BEFORE 'estimate-sent';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'reading-answered' BEFORE 'estimate-sent';--> statement-breakpoint
CREATE TABLE "reading_requests" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"help_request_id" integer,
	"kind" "reading_request_kind" NOT NULL,
	"body" text NOT NULL,
	"asked_by_id" integer,
	"answered_at" timestamp with time zone,
	"answered_by_id" integer,
	"answer_note" text DEFAULT '' NOT NULL,
	"measurement_id" integer,
	"photo_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "symptom_checks" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"symptom_id" text NOT NULL,
	"cause_id" text NOT NULL,
	"result" "cause_result" NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"measurement_id" integer,
	"finding_id" integer,
	"checked_by_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "notifications" ALTER COLUMN "finding_id" DROP NOT NULL;--> statement-breakpoint
ALTER TABLE "notifications" ADD COLUMN "help_request_id" integer;--> statement-breakpoint
ALTER TABLE "notifications" ADD COLUMN "reading_request_id" integer;--> statement-breakpoint
ALTER TABLE "help_requests" ADD COLUMN "symptom_ids" text[] DEFAULT '{}'::text[] NOT NULL;--> statement-breakpoint
ALTER TABLE "reading_requests" ADD CONSTRAINT "reading_requests_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reading_requests" ADD CONSTRAINT "reading_requests_help_request_id_help_requests_id_fk" FOREIGN KEY ("help_request_id") REFERENCES "public"."help_requests"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reading_requests" ADD CONSTRAINT "reading_requests_asked_by_id_users_id_fk" FOREIGN KEY ("asked_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reading_requests" ADD CONSTRAINT "reading_requests_answered_by_id_users_id_fk" FOREIGN KEY ("answered_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reading_requests" ADD CONSTRAINT "reading_requests_measurement_id_measurements_id_fk" FOREIGN KEY ("measurement_id") REFERENCES "public"."measurements"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reading_requests" ADD CONSTRAINT "reading_requests_photo_id_photos_id_fk" FOREIGN KEY ("photo_id") REFERENCES "public"."photos"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "symptom_checks" ADD CONSTRAINT "symptom_checks_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "symptom_checks" ADD CONSTRAINT "symptom_checks_measurement_id_measurements_id_fk" FOREIGN KEY ("measurement_id") REFERENCES "public"."measurements"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "symptom_checks" ADD CONSTRAINT "symptom_checks_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "symptom_checks" ADD CONSTRAINT "symptom_checks_checked_by_id_users_id_fk" FOREIGN KEY ("checked_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "reading_requests_restoration_id_idx" ON "reading_requests" USING btree ("restoration_id");--> statement-breakpoint
CREATE INDEX "reading_requests_help_request_id_idx" ON "reading_requests" USING btree ("help_request_id");--> statement-breakpoint
CREATE INDEX "reading_requests_asked_by_id_idx" ON "reading_requests" USING btree ("asked_by_id");--> statement-breakpoint
CREATE INDEX "reading_requests_answered_by_id_idx" ON "reading_requests" USING btree ("answered_by_id");--> statement-breakpoint
CREATE INDEX "reading_requests_measurement_id_idx" ON "reading_requests" USING btree ("measurement_id");--> statement-breakpoint
CREATE INDEX "reading_requests_photo_id_idx" ON "reading_requests" USING btree ("photo_id");--> statement-breakpoint
CREATE UNIQUE INDEX "symptom_checks_restoration_id_symptom_id_cause_id_idx" ON "symptom_checks" USING btree ("restoration_id","symptom_id","cause_id");--> statement-breakpoint
CREATE INDEX "symptom_checks_measurement_id_idx" ON "symptom_checks" USING btree ("measurement_id");--> statement-breakpoint
CREATE INDEX "symptom_checks_finding_id_idx" ON "symptom_checks" USING btree ("finding_id");--> statement-breakpoint
CREATE INDEX "symptom_checks_checked_by_id_idx" ON "symptom_checks" USING btree ("checked_by_id");--> statement-breakpoint
ALTER TABLE "notifications" ADD CONSTRAINT "notifications_help_request_id_help_requests_id_fk" FOREIGN KEY ("help_request_id") REFERENCES "public"."help_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notifications" ADD CONSTRAINT "notifications_reading_request_id_reading_requests_id_fk" FOREIGN KEY ("reading_request_id") REFERENCES "public"."reading_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "notifications_help_request_id_idx" ON "notifications" USING btree ("help_request_id");--> statement-breakpoint
CREATE INDEX "notifications_reading_request_id_idx" ON "notifications" USING btree ("reading_request_id");