CREATE TYPE "public"."mismatch_kind" AS ENUM('value-differs', 'unlisted-part', 'misprint', 'other');--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'sheet-added';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'reference-marked';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'mismatch-noted';--> statement-breakpoint
CREATE TABLE "mismatch_notes" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"ref" text NOT NULL,
	"kind" "mismatch_kind" NOT NULL,
	"diagram_says" text DEFAULT '' NOT NULL,
	"chassis_has" text DEFAULT '' NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"owner_visible" boolean DEFAULT false NOT NULL,
	"created_by_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "events" ADD COLUMN "sheet_page_id" integer;--> statement-breakpoint
ALTER TABLE "events" ADD COLUMN "mismatch_note_id" integer;--> statement-breakpoint
ALTER TABLE "mismatch_notes" ADD CONSTRAINT "mismatch_notes_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "mismatch_notes" ADD CONSTRAINT "mismatch_notes_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "mismatch_notes_restoration_id_ref_idx" ON "mismatch_notes" USING btree ("restoration_id","ref");--> statement-breakpoint
CREATE INDEX "mismatch_notes_created_by_id_idx" ON "mismatch_notes" USING btree ("created_by_id");--> statement-breakpoint
ALTER TABLE "events" ADD CONSTRAINT "events_sheet_page_id_sheet_pages_id_fk" FOREIGN KEY ("sheet_page_id") REFERENCES "public"."sheet_pages"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "events" ADD CONSTRAINT "events_mismatch_note_id_mismatch_notes_id_fk" FOREIGN KEY ("mismatch_note_id") REFERENCES "public"."mismatch_notes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "events_sheet_page_id_idx" ON "events" USING btree ("sheet_page_id");--> statement-breakpoint
CREATE INDEX "events_mismatch_note_id_idx" ON "events" USING btree ("mismatch_note_id");