CREATE TYPE "public"."estimate_decision" AS ENUM('approved', 'declined');--> statement-breakpoint
CREATE TYPE "public"."estimate_extra" AS ENUM('no-schematic', 'earlier-work', 'cabinet', 'other');--> statement-breakpoint
CREATE TYPE "public"."estimate_line_kind" AS ENUM('labour', 'part', 'extra');--> statement-breakpoint
CREATE TYPE "public"."invoice_kind" AS ENUM('deposit', 'final', 'credit-note');--> statement-breakpoint
CREATE TYPE "public"."tax_rounding" AS ENUM('invoice-down', 'invoice-half-up', 'line-half-up');--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'estimate-sent';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'estimate-decided';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'labour-logged';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'invoice-issued';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'invoice-voided';--> statement-breakpoint
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
CREATE TABLE "invoice_counters" (
	"id" integer PRIMARY KEY DEFAULT 1 NOT NULL,
	"last" integer DEFAULT 0 NOT NULL,
	CONSTRAINT "invoice_counters_single_row" CHECK ("invoice_counters"."id" = 1)
);
--> statement-breakpoint
CREATE TABLE "invoice_lines" (
	"id" serial PRIMARY KEY NOT NULL,
	"invoice_id" integer NOT NULL,
	"position" integer NOT NULL,
	"description" text NOT NULL,
	"net" integer NOT NULL,
	"tax" integer NOT NULL
);
--> statement-breakpoint
CREATE TABLE "invoices" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"number" integer NOT NULL,
	"kind" "invoice_kind" NOT NULL,
	"currency" text NOT NULL,
	"tax_name" text NOT NULL,
	"tax_rate_basis_points" integer,
	"tax_rounding" "tax_rounding" NOT NULL,
	"net" integer NOT NULL,
	"tax" integer NOT NULL,
	"gross" integer NOT NULL,
	"deducted" integer DEFAULT 0 NOT NULL,
	"due" integer NOT NULL,
	"paid" integer DEFAULT 0 NOT NULL,
	"credits_invoice_id" integer,
	"voided_at" timestamp with time zone,
	"void_reason" text,
	"issued_by_id" integer,
	"issued_at" timestamp with time zone DEFAULT now() NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "labour_entries" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"technician_id" integer,
	"finding_id" integer,
	"stage" "stage",
	"note" text DEFAULT '' NOT NULL,
	"billable" boolean DEFAULT true NOT NULL,
	"started_at" timestamp with time zone DEFAULT now() NOT NULL,
	"stopped_at" timestamp with time zone,
	"minutes" integer,
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
ALTER TABLE "invoice_lines" ADD CONSTRAINT "invoice_lines_invoice_id_invoices_id_fk" FOREIGN KEY ("invoice_id") REFERENCES "public"."invoices"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invoices" ADD CONSTRAINT "invoices_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invoices" ADD CONSTRAINT "invoices_issued_by_id_users_id_fk" FOREIGN KEY ("issued_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "labour_entries" ADD CONSTRAINT "labour_entries_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "labour_entries" ADD CONSTRAINT "labour_entries_technician_id_users_id_fk" FOREIGN KEY ("technician_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "labour_entries" ADD CONSTRAINT "labour_entries_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "estimate_lines_estimate_id_idx" ON "estimate_lines" USING btree ("estimate_id");--> statement-breakpoint
CREATE UNIQUE INDEX "estimates_restoration_id_version_idx" ON "estimates" USING btree ("restoration_id","version");--> statement-breakpoint
CREATE INDEX "invoice_lines_invoice_id_idx" ON "invoice_lines" USING btree ("invoice_id");--> statement-breakpoint
CREATE UNIQUE INDEX "invoices_number_idx" ON "invoices" USING btree ("number");--> statement-breakpoint
CREATE INDEX "invoices_restoration_id_idx" ON "invoices" USING btree ("restoration_id");--> statement-breakpoint
CREATE INDEX "labour_entries_restoration_id_idx" ON "labour_entries" USING btree ("restoration_id");--> statement-breakpoint
CREATE INDEX "labour_entries_technician_id_started_at_idx" ON "labour_entries" USING btree ("technician_id","started_at");--> statement-breakpoint
CREATE UNIQUE INDEX "labour_entries_running_idx" ON "labour_entries" USING btree ("technician_id") WHERE "labour_entries"."stopped_at" is null;