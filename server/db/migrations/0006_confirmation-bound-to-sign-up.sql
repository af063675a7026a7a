ALTER TABLE "account_tokens" ADD COLUMN "password_hash" text;--> statement-breakpoint
ALTER TABLE "account_tokens" ADD COLUMN "name" text;