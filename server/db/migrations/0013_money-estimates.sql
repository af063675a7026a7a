CREATE TYPE "public"."estimate_decision" AS ENUM('approved', 'declined');--> statement-breakpoint
CREATE TYPE "public"."estimate_extra" AS ENUM('no-schematic', 'earlier-work', 'cabinet', 'other');--> statement-breakpoint
CREATE TYPE "public"."estimate_line_kind" AS ENUM('labour', 'part', 'extra');--> statement-breakpoint
CREATE TYPE "public"."tax_rounding" AS ENUM('invoice-down', 'invoice-half-up', 'line-half-up');--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'estimate-sent';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'estimate-decided';--> statement-breakpoint
CREATE TABLE "estimate_lines" (
	"id" serial PRIMARY KEY NOT NULL,
	"estimate_id" integer NOT NULL,
	"position" integer NOT NULL,
	"kind" "estimate_line_kind" NOT NULL,
	"description" text NOT NULL,
	"extra" "estimate_extra",
	"minutes_low" integer,
	"minutes_high" integer,
	"amount_low" integer,
	"amount_high" integer
);
--> statement-breakpoint
CREATE TABLE "estimates" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"version" integer NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"currency" text NOT NULL,
	"labour_rate" integer NOT NULL,
	"parts_markup_basis_points" integer NOT NULL,
	"tax_name" text NOT NULL,
	"tax_rate_basis_points" integer,
	"tax_rounding" "tax_rounding" NOT NULL,
	"low_amount" integer NOT NULL,
	"high_amount" integer NOT NULL,
	"sent" boolean DEFAULT false NOT NULL,
	"sent_at" timestamp with time zone,
	"created_by_id" integer,
	"decision" "estimate_decision",
	"decided_by_name" text,
	"decided_by_id" integer,
	"decided_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "workshop_settings" (
	"id" integer PRIMARY KEY DEFAULT 1 NOT NULL,
	"currency" text DEFAULT 'GBP' NOT NULL,
	"labour_rate" integer DEFAULT 4500 NOT NULL,
	"parts_markup_basis_points" integer DEFAULT 2000 NOT NULL,
	"tax_name" text DEFAULT 'VAT' NOT NULL,
	"tax_rate_basis_points" integer,
	"tax_rounding" "tax_rounding" DEFAULT 'invoice-down' NOT NULL,
	"estimate_approval_required" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "workshop_settings_single_row" CHECK ("workshop_settings"."id" = 1)
);
--> statement-breakpoint
ALTER TABLE "estimate_lines" ADD CONSTRAINT "estimate_lines_estimate_id_estimates_id_fk" FOREIGN KEY ("estimate_id") REFERENCES "public"."estimates"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_decided_by_id_users_id_fk" FOREIGN KEY ("decided_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "estimate_lines_estimate_id_idx" ON "estimate_lines" USING btree ("estimate_id");--> statement-breakpoint
CREATE UNIQUE INDEX "estimates_restoration_id_version_idx" ON "estimates" USING btree ("restoration_id","version");