ALTER TABLE "invoices" DROP CONSTRAINT "invoices_restoration_id_restorations_id_fk";
--> statement-breakpoint
ALTER TABLE "invoices" ADD COLUMN "number_prefix" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "workshop_settings" ADD COLUMN "invoice_prefix" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "workshop_settings" ADD COLUMN "time_zone" text DEFAULT 'Europe/London' NOT NULL;--> statement-breakpoint
ALTER TABLE "invoices" ADD CONSTRAINT "invoices_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE restrict ON UPDATE no action;