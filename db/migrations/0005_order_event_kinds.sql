ALTER TABLE "order_events" ADD COLUMN "kind" text DEFAULT 'step' NOT NULL;--> statement-breakpoint
-- notes typed at release and at the shop's steps were for staff: keep them as staff notes, off the customer's timeline
INSERT INTO "order_events" ("order_id", "actor_id", "status", "kind", "note", "created_at")
  SELECT "order_id", "actor_id", "status", 'note', "note", "created_at" FROM "order_events"
  WHERE "kind" = 'step' AND "note" IS NOT NULL AND "actor_id" IS NOT NULL AND "status" IN ('released', 'cutting', 'tubing', 'shell-and-heads', 'hydrotest', 'on-hold');--> statement-breakpoint
UPDATE "order_events" SET "note" = NULL
  WHERE "kind" = 'step' AND "note" IS NOT NULL AND "actor_id" IS NOT NULL AND "status" IN ('released', 'cutting', 'tubing', 'shell-and-heads', 'hydrotest', 'on-hold');
