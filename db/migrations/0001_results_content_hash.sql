ALTER TABLE "results" ADD COLUMN "content_hash" text;--> statement-breakpoint
ALTER TABLE "results" ADD COLUMN "overview" jsonb;--> statement-breakpoint
CREATE INDEX "results_content_hash_idx" ON "results" USING btree ("content_hash");