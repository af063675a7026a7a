CREATE TYPE "public"."measured_quantity" AS ENUM('esr', 'capacitance', 'leakage', 'resistance', 'dc-voltage', 'ac-voltage', 'current', 'insulation', 'frequency');--> statement-breakpoint
CREATE TYPE "public"."verdict" AS ENUM('within', 'marginal', 'out', 'unknown');--> statement-breakpoint
CREATE TABLE "measurements" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"finding_id" integer,
	"location" text NOT NULL,
	"quantity" "measured_quantity" NOT NULL,
	"expected_text" text DEFAULT '' NOT NULL,
	"tolerance_text" text DEFAULT '' NOT NULL,
	"rating_text" text DEFAULT '' NOT NULL,
	"reading_text" text NOT NULL,
	"conditions" text DEFAULT '' NOT NULL,
	"method" text DEFAULT '' NOT NULL,
	"expected" double precision,
	"reading" double precision NOT NULL,
	"rating" double precision,
	"reference" double precision,
	"deviation" double precision,
	"verdict" "verdict" NOT NULL,
	"verdict_reason" text NOT NULL,
	"owner_visible" boolean DEFAULT false NOT NULL,
	"measured_by_id" integer,
	"measured_at" timestamp with time zone DEFAULT now() NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "valves" (
	"id" serial PRIMARY KEY NOT NULL,
	"restoration_id" integer NOT NULL,
	"position" text NOT NULL,
	"type" text NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "measurements" ADD CONSTRAINT "measurements_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "measurements" ADD CONSTRAINT "measurements_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "measurements" ADD CONSTRAINT "measurements_measured_by_id_users_id_fk" FOREIGN KEY ("measured_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "valves" ADD CONSTRAINT "valves_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "measurements_restoration_id_idx" ON "measurements" USING btree ("restoration_id");--> statement-breakpoint
CREATE INDEX "measurements_finding_id_idx" ON "measurements" USING btree ("finding_id");--> statement-breakpoint
CREATE UNIQUE INDEX "valves_restoration_id_position_idx" ON "valves" USING btree ("restoration_id","position");