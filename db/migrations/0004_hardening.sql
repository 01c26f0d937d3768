CREATE TABLE "mail_log" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"to" text NOT NULL,
	"subject" text NOT NULL,
	"text" text NOT NULL,
	"html" text,
	"status" text DEFAULT 'queued' NOT NULL,
	"attempts" integer DEFAULT 0 NOT NULL,
	"last_error" text,
	"resend_of" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone
);
--> statement-breakpoint
ALTER TABLE "quotes" ADD COLUMN "customer_total_minor" bigint;--> statement-breakpoint
ALTER TABLE "quotes" ADD COLUMN "customer_quantity" integer;--> statement-breakpoint
ALTER TABLE "quotes" ADD COLUMN "customer_design_summary" text;--> statement-breakpoint
-- existing quotes: the customer's figures are those of the last revision that is not a draft
UPDATE "quotes" q SET
	"customer_total_minor" = coalesce(r."total_minor", q."price_total_minor"),
	"customer_quantity" = coalesce((r."data"->'price'->>'quantity')::integer, q."quantity"),
	"customer_design_summary" = q."design_summary"
FROM (SELECT q2."id" AS quote_id, (SELECT r2."total_minor" FROM "quote_revisions" r2 WHERE r2."quote_id" = q2."id" AND r2."kind" <> 'draft' ORDER BY r2."number" DESC LIMIT 1) AS total_minor,
             (SELECT r2."data" FROM "quote_revisions" r2 WHERE r2."quote_id" = q2."id" AND r2."kind" <> 'draft' ORDER BY r2."number" DESC LIMIT 1) AS data
      FROM "quotes" q2) r
WHERE r.quote_id = q."id";--> statement-breakpoint
ALTER TABLE "quotes" ALTER COLUMN "customer_total_minor" SET NOT NULL;--> statement-breakpoint
ALTER TABLE "quotes" ALTER COLUMN "customer_quantity" SET NOT NULL;--> statement-breakpoint
ALTER TABLE "quotes" ALTER COLUMN "customer_design_summary" SET NOT NULL;--> statement-breakpoint
ALTER TABLE "quotes" ADD COLUMN "client_key" text;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "refund_due_minor" bigint DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "refund_status" text DEFAULT 'none' NOT NULL;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "refund_error" text;--> statement-breakpoint
CREATE INDEX "mail_log_status_idx" ON "mail_log" USING btree ("status","created_at");--> statement-breakpoint
CREATE INDEX "mail_log_created_idx" ON "mail_log" USING btree ("created_at");--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_submitter_client_key_uq" UNIQUE("submitted_by","client_key");