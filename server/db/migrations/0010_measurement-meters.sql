ALTER TABLE "measurements" ADD COLUMN "chart_meter_text" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "measurements" ADD COLUMN "meter_text" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "measurements" ADD COLUMN "source_text" text DEFAULT '' NOT NULL;