ALTER TYPE "public"."event_kind" ADD VALUE 'help-requested';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'help-link-made';--> statement-breakpoint
ALTER TYPE "public"."event_kind" ADD VALUE 'help-link-withdrawn';