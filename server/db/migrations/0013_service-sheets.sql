CREATE TYPE "public"."reference_shape" AS ENUM('pin', 'rect');--> statement-breakpoint
CREATE TYPE "public"."sheet_kind" AS ENUM('circuit-diagram', 'layout', 'alignment-table', 'voltage-chart', 'parts-list');--> statement-breakpoint
CREATE TABLE "reference_marks" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"sheet_page_id" integer,
	"photo_id" integer,
	"ref" text NOT NULL,
	"shape" "reference_shape" NOT NULL,
	"points" jsonb NOT NULL,
	"created_by_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "reference_marks_one_target" CHECK (("reference_marks"."sheet_page_id" is null) <> ("reference_marks"."photo_id" is null))
);
--> statement-breakpoint
CREATE TABLE "sheet_pages" (
	"id" serial PRIMARY KEY NOT NULL,
	"sheet_id" integer NOT NULL,
	"restoration_id" integer NOT NULL,
	"page_number" integer NOT NULL,
	"kind" "sheet_kind" NOT NULL,
	"title" text DEFAULT '' NOT NULL,
	"owner_visible" boolean DEFAULT false NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sheets" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"storage_key" text NOT NULL,
	"content_type" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"uploaded_by_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sheets_storageKey_unique" UNIQUE("storage_key")
);
--> statement-breakpoint
ALTER TABLE "reference_marks" ADD CONSTRAINT "reference_marks_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reference_marks" ADD CONSTRAINT "reference_marks_sheet_page_id_sheet_pages_id_fk" FOREIGN KEY ("sheet_page_id") REFERENCES "public"."sheet_pages"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reference_marks" ADD CONSTRAINT "reference_marks_photo_id_photos_id_fk" FOREIGN KEY ("photo_id") REFERENCES "public"."photos"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reference_marks" ADD CONSTRAINT "reference_marks_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sheet_pages" ADD CONSTRAINT "sheet_pages_sheet_id_sheets_id_fk" FOREIGN KEY ("sheet_id") REFERENCES "public"."sheets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sheet_pages" ADD CONSTRAINT "sheet_pages_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sheets" ADD CONSTRAINT "sheets_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sheets" ADD CONSTRAINT "sheets_uploaded_by_id_users_id_fk" FOREIGN KEY ("uploaded_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "reference_marks_restoration_id_ref_idx" ON "reference_marks" USING btree ("restoration_id","ref");--> statement-breakpoint
CREATE INDEX "reference_marks_sheet_page_id_idx" ON "reference_marks" USING btree ("sheet_page_id");--> statement-breakpoint
CREATE INDEX "reference_marks_photo_id_idx" ON "reference_marks" USING btree ("photo_id");--> statement-breakpoint
CREATE INDEX "reference_marks_created_by_id_idx" ON "reference_marks" USING btree ("created_by_id");--> statement-breakpoint
CREATE INDEX "sheet_pages_sheet_id_idx" ON "sheet_pages" USING btree ("sheet_id");--> statement-breakpoint
CREATE INDEX "sheet_pages_restoration_id_idx" ON "sheet_pages" USING btree ("restoration_id");--> statement-breakpoint
CREATE INDEX "sheets_restoration_id_idx" ON "sheets" USING btree ("restoration_id");--> statement-breakpoint
CREATE INDEX "sheets_uploaded_by_id_idx" ON "sheets" USING btree ("uploaded_by_id");