ALTER TABLE "photos" ADD COLUMN "findings_version" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
CREATE INDEX "invitations_invited_by_id_idx" ON "invitations" USING btree ("invited_by_id");--> statement-breakpoint
CREATE INDEX "invitations_accepted_by_id_idx" ON "invitations" USING btree ("accepted_by_id");--> statement-breakpoint
CREATE INDEX "photos_uploaded_by_id_idx" ON "photos" USING btree ("uploaded_by_id");--> statement-breakpoint
CREATE INDEX "comments_author_id_idx" ON "comments" USING btree ("author_id");--> statement-breakpoint
CREATE INDEX "finding_changes_actor_id_idx" ON "finding_changes" USING btree ("actor_id");--> statement-breakpoint
CREATE INDEX "findings_author_id_idx" ON "findings" USING btree ("author_id");--> statement-breakpoint
CREATE INDEX "notifications_restoration_id_idx" ON "notifications" USING btree ("restoration_id");--> statement-breakpoint
CREATE INDEX "notifications_finding_id_idx" ON "notifications" USING btree ("finding_id");--> statement-breakpoint
CREATE INDEX "notifications_comment_id_idx" ON "notifications" USING btree ("comment_id");--> statement-breakpoint
CREATE INDEX "measurements_measured_by_id_idx" ON "measurements" USING btree ("measured_by_id");--> statement-breakpoint
CREATE INDEX "events_actor_id_idx" ON "events" USING btree ("actor_id");--> statement-breakpoint
CREATE INDEX "events_photo_id_idx" ON "events" USING btree ("photo_id");--> statement-breakpoint
CREATE INDEX "events_finding_id_idx" ON "events" USING btree ("finding_id");--> statement-breakpoint
CREATE INDEX "events_part_id_idx" ON "events" USING btree ("part_id");--> statement-breakpoint
CREATE INDEX "events_measurement_id_idx" ON "events" USING btree ("measurement_id");--> statement-breakpoint
CREATE INDEX "parts_finding_id_idx" ON "parts" USING btree ("finding_id");