CREATE TYPE "public"."finding_kind" AS ENUM('overheated', 'cracked', 'leaking', 'corroded', 'dry-joint', 'missing', 'modified', 'noisy-control', 'hazard', 'test-point', 'note');--> statement-breakpoint
CREATE TYPE "public"."notification_kind" AS ENUM('mention', 'question', 'reply');--> statement-breakpoint
CREATE TYPE "public"."finding_severity" AS ENUM('hazard', 'fault', 'wear', 'cosmetic', 'info');--> statement-breakpoint
CREATE TYPE "public"."finding_shape" AS ENUM('pin', 'circle', 'rect', 'arrow', 'freehand');--> statement-breakpoint
CREATE TYPE "public"."finding_status" AS ENUM('observed', 'suspected', 'confirmed', 'repaired', 'verified', 'dismissed');--> statement-breakpoint
CREATE TABLE "comments" (
	"id" serial PRIMARY KEY NOT NULL,
	"finding_id" integer NOT NULL,
	"author_id" integer,
	"body" text NOT NULL,
	"internal" boolean DEFAULT true NOT NULL,
	"mentions" integer[] DEFAULT '{}' NOT NULL,
	"edited_at" timestamp with time zone,
	"deleted_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "finding_changes" (
	"id" serial PRIMARY KEY NOT NULL,
	"finding_id" integer NOT NULL,
	"actor_id" integer,
	"changes" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "findings" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"photo_id" integer NOT NULL,
	"number" integer NOT NULL,
	"shape" "finding_shape" NOT NULL,
	"points" jsonb NOT NULL,
	"title" text NOT NULL,
	"component_ref" text DEFAULT '' NOT NULL,
	"kind" "finding_kind" NOT NULL,
	"severity" "finding_severity" NOT NULL,
	"status" "finding_status" DEFAULT 'observed' NOT NULL,
	"dismiss_reason" text,
	"owner_visible" boolean DEFAULT false NOT NULL,
	"author_id" integer,
	"question_open" boolean DEFAULT false NOT NULL,
	"question_asked_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "notifications" (
	"id" serial PRIMARY KEY NOT NULL,
	"user_id" integer NOT NULL,
	"restoration_id" integer NOT NULL,
	"finding_id" integer NOT NULL,
	"comment_id" integer,
	"kind" "notification_kind" NOT NULL,
	"summary" text NOT NULL,
	"read_at" timestamp with time zone,
	"emailed_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "finding_changes" ADD CONSTRAINT "finding_changes_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "finding_changes" ADD CONSTRAINT "finding_changes_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_photo_id_photos_id_fk" FOREIGN KEY ("photo_id") REFERENCES "public"."photos"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notifications" ADD CONSTRAINT "notifications_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notifications" ADD CONSTRAINT "notifications_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notifications" ADD CONSTRAINT "notifications_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notifications" ADD CONSTRAINT "notifications_comment_id_comments_id_fk" FOREIGN KEY ("comment_id") REFERENCES "public"."comments"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "comments_finding_id_idx" ON "comments" USING btree ("finding_id");--> statement-breakpoint
CREATE INDEX "finding_changes_finding_id_idx" ON "finding_changes" USING btree ("finding_id");--> statement-breakpoint
CREATE INDEX "findings_photo_id_idx" ON "findings" USING btree ("photo_id");--> statement-breakpoint
CREATE UNIQUE INDEX "findings_restoration_id_number_idx" ON "findings" USING btree ("restoration_id","number");--> statement-breakpoint
CREATE INDEX "notifications_user_id_idx" ON "notifications" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "notifications_emailed_at_idx" ON "notifications" USING btree ("emailed_at");