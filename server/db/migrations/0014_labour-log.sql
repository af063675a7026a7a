ALTER TYPE "public"."event_kind" ADD VALUE 'labour-logged';--> statement-breakpoint
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
ALTER TABLE "labour_entries" ADD CONSTRAINT "labour_entries_restoration_id_restorations_id_fk" FOREIGN KEY ("restoration_id") REFERENCES "public"."restorations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "labour_entries" ADD CONSTRAINT "labour_entries_technician_id_users_id_fk" FOREIGN KEY ("technician_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "labour_entries" ADD CONSTRAINT "labour_entries_finding_id_findings_id_fk" FOREIGN KEY ("finding_id") REFERENCES "public"."findings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "labour_entries_restoration_id_idx" ON "labour_entries" USING btree ("restoration_id");--> statement-breakpoint
CREATE INDEX "labour_entries_technician_id_started_at_idx" ON "labour_entries" USING btree ("technician_id","started_at");--> statement-breakpoint
CREATE UNIQUE INDEX "labour_entries_running_idx" ON "labour_entries" USING btree ("technician_id") WHERE "labour_entries"."stopped_at" is null;