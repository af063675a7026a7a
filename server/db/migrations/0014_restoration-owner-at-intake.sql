ALTER TABLE "restorations" ADD COLUMN "owner_name" text;--> statement-breakpoint
ALTER TABLE "restorations" ADD COLUMN "owner_email" text;