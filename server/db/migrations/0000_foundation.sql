CREATE TYPE "public"."equipment_kind" AS ENUM('radio', 'radiogram', 'amplifier', 'tape-recorder', 'television', 'test-gear', 'other');--> statement-breakpoint
CREATE TYPE "public"."stage" AS ENUM('intake', 'assessment', 'repair', 'testing', 'returned', 'on-hold');--> statement-breakpoint
CREATE TYPE "public"."work_level" AS ENUM('make-it-play', 'repair', 'refurbish', 'full-restoration');--> statement-breakpoint
CREATE TYPE "public"."role" AS ENUM('technician', 'mentor', 'owner');--> statement-breakpoint
CREATE TABLE "users" (
	"id" serial PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"email" text NOT NULL,
	"password_hash" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "restorations" (
	"id" serial PRIMARY KEY NOT NULL,
	"make" text NOT NULL,
	"model" text NOT NULL,
	"year" integer,
	"serial" text,
	"equipment_kind" "equipment_kind" DEFAULT 'radio' NOT NULL,
	"mains_setting" text,
	"live_chassis" boolean DEFAULT false NOT NULL,
	"symptoms" text,
	"condition_notes" text,
	"work_level" "work_level" DEFAULT 'repair' NOT NULL,
	"hidden_parts_original" boolean DEFAULT false NOT NULL,
	"story" text,
	"received_on" date,
	"stage" "stage" DEFAULT 'intake' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "memberships" (
	"restoration_id" integer NOT NULL,
	"user_id" integer NOT NULL,
	"role" "role" NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "memberships_restoration_id_user_id_pk" PRIMARY KEY("restoration_id","user_id")
);
--> statement-breakpoint
CREATE TABLE "dev_mails" (
	"id" serial PRIMARY KEY NOT NULL,
	"to" text NOT NULL,
	"from" text NOT NULL,
	"subject" text NOT NULL,
	"text" text NOT NULL,
	"html" text,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "users_email_lower_idx" ON "users" USING btree (lower("email"));--> statement-breakpoint
CREATE INDEX "restorations_stage_idx" ON "restorations" USING btree ("stage");--> statement-breakpoint
CREATE INDEX "memberships_user_id_idx" ON "memberships" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "dev_mails_received_at_idx" ON "dev_mails" USING btree ("received_at");