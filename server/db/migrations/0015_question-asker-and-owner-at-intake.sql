ALTER TABLE "restorations" ADD COLUMN "owner_name" text;--> statement-breakpoint
ALTER TABLE "restorations" ADD COLUMN "owner_email" text;--> statement-breakpoint
ALTER TABLE "findings" ADD COLUMN "question_asked_by_id" integer;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_question_asked_by_id_users_id_fk" FOREIGN KEY ("question_asked_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "findings_question_asked_by_id_idx" ON "findings" USING btree ("question_asked_by_id");