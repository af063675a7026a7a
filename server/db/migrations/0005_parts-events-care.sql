CREATE TYPE "public"."event_kind" AS ENUM('photo-added', 'finding-opened', 'finding-status', 'question-asked', 'question-resolved', 'part-fitted', 'stage-changed', 'measurement-out');--> statement-breakpoint
CREATE TYPE "public"."mains_position" AS ENUM('none', 'across-line', 'line-to-chassis');--> statement-breakpoint
CREATE TYPE "public"."part_action" AS ENUM('replaced', 'restuffed', 'kept-original', 'removed');--> statement-breakpoint
CREATE TYPE "public"."part_state" AS ENUM('planned', 'ordered', 'fitted');--> statement-breakpoint
CREATE TABLE "events" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"kind" "event_kind" NOT NULL,
	"actor_id" integer,
	"photo_id" integer,
	"finding_id" integer,
	"part_id" integer,
	"measurement_id" integer,
	"data" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "parts" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"finding_id" integer,
	"component_ref" text NOT NULL,
	"original_part" text DEFAULT '' NOT NULL,
	"original_rating" text DEFAULT '' NOT NULL,
	"replacement_part" text DEFAULT '' NOT NULL,
	"replacement_rating" text DEFAULT '' NOT NULL,
	"action" "part_action" NOT NULL,
	"state" "part_state" DEFAULT 'planned' NOT NULL,
	"mains_position" "mains_position" DEFAULT 'none' NOT NULL,
	"quantity" integer DEFAULT 1 NOT NULL,
	"cost_minor" integer,
	"source" text DEFAULT '' NOT NULL,
	"tested_after" text DEFAULT '' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"fitted_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "restorations" ADD COLUMN "care_notes" text;--> statement-breakpoint
ALTER TABLE "events" ADD CONSTRAINT "events_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "events" ADD CONSTRAINT "events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "events" ADD CONSTRAINT "events_photo_id_photos_id_fk" FOREIGN KEY ("photo_id") REFERENCES "public"."photos"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "events" ADD CONSTRAINT "events_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "events" ADD CONSTRAINT "events_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "events" ADD CONSTRAINT "events_measurement_id_measurements_id_fk" FOREIGN KEY ("measurement_id") REFERENCES "public"."measurements"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "parts" ADD CONSTRAINT "parts_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "parts" ADD CONSTRAINT "parts_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "events_restoration_id_created_at_idx" ON "events" USING btree ("restoration_id","created_at");--> statement-breakpoint
CREATE INDEX "parts_restoration_id_idx" ON "parts" USING btree ("restoration_id");