CREATE INDEX "report_sends_sent_by_id_idx" ON "report_sends" USING btree ("sent_by_id");--> statement-breakpoint
CREATE INDEX "safety_overrides_actor_id_idx" ON "safety_overrides" USING btree ("actor_id");--> statement-breakpoint
CREATE INDEX "safety_tests_tested_by_id_idx" ON "safety_tests" USING btree ("tested_by_id");--> statement-breakpoint
CREATE INDEX "soak_sessions_finding_id_idx" ON "soak_sessions" USING btree ("finding_id");--> statement-breakpoint
CREATE INDEX "soak_sessions_started_by_id_idx" ON "soak_sessions" USING btree ("started_by_id");--> statement-breakpoint
CREATE INDEX "bringup_steps_finding_id_idx" ON "bringup_steps" USING btree ("finding_id");--> statement-breakpoint
CREATE INDEX "bringup_steps_taken_by_id_idx" ON "bringup_steps" USING btree ("taken_by_id");--> statement-breakpoint
CREATE INDEX "intake_checks_finding_id_idx" ON "intake_checks" USING btree ("finding_id");--> statement-breakpoint
CREATE INDEX "intake_checks_photo_id_idx" ON "intake_checks" USING btree ("photo_id");--> statement-breakpoint
CREATE INDEX "intake_checks_checked_by_id_idx" ON "intake_checks" USING btree ("checked_by_id");--> statement-breakpoint
CREATE INDEX "pre_power_checks_checked_by_id_idx" ON "pre_power_checks" USING btree ("checked_by_id");--> statement-breakpoint
CREATE INDEX "pre_power_signoffs_signed_by_id_idx" ON "pre_power_signoffs" USING btree ("signed_by_id");--> statement-breakpoint
CREATE INDEX "estimates_created_by_id_idx" ON "estimates" USING btree ("created_by_id");--> statement-breakpoint
CREATE INDEX "estimates_decided_by_id_idx" ON "estimates" USING btree ("decided_by_id");--> statement-breakpoint
CREATE INDEX "invoices_issued_by_id_idx" ON "invoices" USING btree ("issued_by_id");--> statement-breakpoint
CREATE INDEX "labour_entries_finding_id_idx" ON "labour_entries" USING btree ("finding_id");