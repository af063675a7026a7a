CREATE TYPE "public"."photo_phase" AS ENUM('before', 'during', 'after');--> statement-breakpoint
CREATE TYPE "public"."photo_view" AS ENUM('top', 'underside', 'rear', 'front', 'detail', 'schematic', 'other');--> statement-breakpoint
CREATE TABLE "photos" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"storage_key" text NOT NULL,
	"view" "photo_view" NOT NULL,
	"phase" "photo_phase" NOT NULL,
	"caption" text DEFAULT '' NOT NULL,
	"owner_visible" boolean DEFAULT false NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"taken_at" timestamp with time zone,
	"content_type" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"uploaded_by_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "photos_storageKey_unique" UNIQUE("storage_key")
);
--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_uploaded_by_id_users_id_fk" FOREIGN KEY ("uploaded_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "photos_restoration_id_idx" ON "photos" USING btree ("restoration_id");