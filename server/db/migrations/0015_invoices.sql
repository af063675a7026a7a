CREATE TYPE "public"."invoice_kind" AS ENUM('deposit', 'final', 'credit-note');--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'invoice-issued';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'invoice-voided';--> statement-breakpoint
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
ALTER TABLE "invoice_lines" ADD CONSTRAINT "invoice_lines_invoice_id_invoices_id_fk" FOREIGN KEY ("invoice_id") REFERENCES "public"."invoices"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invoices" ADD CONSTRAINT "invoices_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invoices" ADD CONSTRAINT "invoices_issued_by_id_users_id_fk" FOREIGN KEY ("issued_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "invoice_lines_invoice_id_idx" ON "invoice_lines" USING btree ("invoice_id");--> statement-breakpoint
CREATE UNIQUE INDEX "invoices_number_idx" ON "invoices" USING btree ("number");--> statement-breakpoint
CREATE INDEX "invoices_restoration_id_idx" ON "invoices" USING btree ("restoration_id");