ALTER TABLE "users" ADD COLUMN "workshop_admin" boolean DEFAULT false NOT NULL;--> statement-breakpoint
UPDATE "users" SET "workshop_admin" = true WHERE "id" = (SELECT "user_id" FROM "memberships" WHERE "role" = 'technician' ORDER BY "created_at", "user_id" LIMIT 1);
