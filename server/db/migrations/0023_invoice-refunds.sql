ALTER TABLE "invoices" ADD COLUMN "refunded" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "payments" ADD COLUMN "refund_due" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
UPDATE "invoices" SET "refunded" = coalesce((SELECT sum("amount") FROM "payments" WHERE "payments"."invoice_id" = "invoices"."id" AND "payments"."kind" = 'refund' AND "payments"."status" = 'succeeded'), 0);
