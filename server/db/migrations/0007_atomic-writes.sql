ALTER TABLE "comments" ADD COLUMN "idempotency_key" text;--> statement-breakpoint
ALTER TABLE "notifications" ADD COLUMN "mail_claimed_at" timestamp with time zone;--> statement-breakpoint
CREATE UNIQUE INDEX "comments_author_id_idempotency_key_idx" ON "comments" USING btree ("author_id","idempotency_key");