CREATE TYPE "public"."bringup_decision" AS ENUM('go-on', 'stop');--> statement-breakpoint
CREATE TYPE "public"."intake_item" AS ENUM('valve-line-up', 'mains-lead', 'rubber-wiring', 'mains-tap', 'live-chassis', 'missing-parts', 'covers-knobs');--> statement-breakpoint
CREATE TYPE "public"."lamp_behaviour" AS ENUM('no-lamp', 'flash-then-dim', 'steady-glow', 'bright-staying');--> statement-breakpoint
CREATE TYPE "public"."pre_power_item" AS ENUM('mains-tap', 'filter-capacitors', 'rectifier-transformer', 'current-limiter', 'isolation-transformer', 'discharge-method');--> statement-breakpoint
CREATE TYPE "public"."pre_power_status" AS ENUM('done', 'not-applicable', 'waived');--> statement-breakpoint
CREATE TYPE "public"."bringup_supply" AS ENUM('series-lamp', 'variable-transformer', 'lamp-and-variable-transformer', 'full-mains');--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'intake-checked';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'pre-power-set';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'pre-power-signed';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'pre-power-voided';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'bringup-step';--> statement-breakpoint
CREATE TABLE "bringup_step_readings" (
	"step_id" integer NOT NULL,
	"measurement_id" integer NOT NULL,
	CONSTRAINT "bringup_step_readings_step_id_measurement_id_pk" PRIMARY KEY("step_id","measurement_id")
);
--> statement-breakpoint
CREATE TABLE "bringup_steps" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"number" integer NOT NULL,
	"supply" "bringup_supply" NOT NULL,
	"lamp_watts" double precision,
	"lamp_volts" double precision,
	"applied_volts" double precision,
	"lamp_behaviour" "lamp_behaviour" NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"decision" "bringup_decision" NOT NULL,
	"finding_id" integer,
	"taken_by_id" integer,
	"taken_at" timestamp with time zone DEFAULT now() NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "intake_checks" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"item" "intake_item" NOT NULL,
	"done" boolean DEFAULT false NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"finding_id" integer,
	"photo_id" integer,
	"checked_by_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "pre_power_checks" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"item" "pre_power_item" NOT NULL,
	"status" "pre_power_status",
	"reason" text DEFAULT '' NOT NULL,
	"checked_by_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "pre_power_signoffs" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"signed_by_id" integer,
	"signed_at" timestamp with time zone DEFAULT now() NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "measurements" ADD COLUMN "power_on" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "bringup_step_readings" ADD CONSTRAINT "bringup_step_readings_step_id_bringup_steps_id_fk" FOREIGN KEY ("step_id") REFERENCES "public"."bringup_steps"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bringup_step_readings" ADD CONSTRAINT "bringup_step_readings_measurement_id_measurements_id_fk" FOREIGN KEY ("measurement_id") REFERENCES "public"."measurements"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bringup_steps" ADD CONSTRAINT "bringup_steps_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bringup_steps" ADD CONSTRAINT "bringup_steps_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bringup_steps" ADD CONSTRAINT "bringup_steps_taken_by_id_users_id_fk" FOREIGN KEY ("taken_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "intake_checks" ADD CONSTRAINT "intake_checks_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "intake_checks" ADD CONSTRAINT "intake_checks_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "intake_checks" ADD CONSTRAINT "intake_checks_photo_id_photos_id_fk" FOREIGN KEY ("photo_id") REFERENCES "public"."photos"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "intake_checks" ADD CONSTRAINT "intake_checks_checked_by_id_users_id_fk" FOREIGN KEY ("checked_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pre_power_checks" ADD CONSTRAINT "pre_power_checks_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pre_power_checks" ADD CONSTRAINT "pre_power_checks_checked_by_id_users_id_fk" FOREIGN KEY ("checked_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pre_power_signoffs" ADD CONSTRAINT "pre_power_signoffs_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pre_power_signoffs" ADD CONSTRAINT "pre_power_signoffs_signed_by_id_users_id_fk" FOREIGN KEY ("signed_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "bringup_step_readings_measurement_id_idx" ON "bringup_step_readings" USING btree ("measurement_id");--> statement-breakpoint
CREATE UNIQUE INDEX "bringup_steps_restoration_id_number_idx" ON "bringup_steps" USING btree ("restoration_id","number");--> statement-breakpoint
CREATE UNIQUE INDEX "intake_checks_restoration_id_item_idx" ON "intake_checks" USING btree ("restoration_id","item");--> statement-breakpoint
CREATE UNIQUE INDEX "pre_power_checks_restoration_id_item_idx" ON "pre_power_checks" USING btree ("restoration_id","item");--> statement-breakpoint
CREATE UNIQUE INDEX "pre_power_signoffs_restoration_id_idx" ON "pre_power_signoffs" USING btree ("restoration_id");