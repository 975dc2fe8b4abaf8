CREATE TYPE "public"."sweep_status" AS ENUM('running', 'cancelled', 'completed', 'failed');--> statement-breakpoint
CREATE TABLE "sweep_chunks" (
	"sweep_id" uuid NOT NULL,
	"chunk_index" integer NOT NULL,
	"tag" integer NOT NULL,
	"done_at" timestamp with time zone,
	CONSTRAINT "sweep_chunks_pk" PRIMARY KEY("sweep_id","chunk_index")
);
--> statement-breakpoint
CREATE TABLE "sweep_points" (
	"sweep_id" uuid NOT NULL,
	"point_index" integer NOT NULL,
	"supercharges" integer,
	"tachyonic_sectors" integer DEFAULT 0 NOT NULL,
	"lightest_mass_squared" double precision,
	"massless_states" text,
	"gauge_group" text,
	"problem" text,
	CONSTRAINT "sweep_points_pk" PRIMARY KEY("sweep_id","point_index")
);
--> statement-breakpoint
CREATE TABLE "sweeps" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"configuration_id" uuid NOT NULL,
	"revision_id" uuid NOT NULL,
	"title" text DEFAULT '' NOT NULL,
	"definition" jsonb NOT NULL,
	"total_points" integer NOT NULL,
	"chunk_size" integer NOT NULL,
	"chunk_count" integer NOT NULL,
	"done_points" integer DEFAULT 0 NOT NULL,
	"status" "sweep_status" DEFAULT 'running' NOT NULL,
	"generation" integer DEFAULT 1 NOT NULL,
	"attached_to_starter" boolean DEFAULT false NOT NULL,
	"failure" text,
	"created_by" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"started_at" timestamp with time zone DEFAULT now() NOT NULL,
	"started_points" integer DEFAULT 0 NOT NULL,
	"finished_at" timestamp with time zone,
	CONSTRAINT "sweeps_points" CHECK ("sweeps"."done_points" >= 0 and "sweeps"."done_points" <= "sweeps"."total_points" and "sweeps"."chunk_size" >= 1)
);
--> statement-breakpoint
ALTER TABLE "sweep_chunks" ADD CONSTRAINT "sweep_chunks_sweep_id_sweeps_id_fk" FOREIGN KEY ("sweep_id") REFERENCES "public"."sweeps"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sweep_points" ADD CONSTRAINT "sweep_points_sweep_id_sweeps_id_fk" FOREIGN KEY ("sweep_id") REFERENCES "public"."sweeps"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sweeps" ADD CONSTRAINT "sweeps_configuration_id_configurations_id_fk" FOREIGN KEY ("configuration_id") REFERENCES "public"."configurations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sweeps" ADD CONSTRAINT "sweeps_revision_id_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."revisions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sweeps" ADD CONSTRAINT "sweeps_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "sweep_chunks_waiting_tag_idx" ON "sweep_chunks" USING btree ("tag") WHERE "sweep_chunks"."done_at" is null;--> statement-breakpoint
CREATE INDEX "sweep_chunks_done_idx" ON "sweep_chunks" USING btree ("sweep_id","done_at");--> statement-breakpoint
CREATE INDEX "sweeps_configuration_created_idx" ON "sweeps" USING btree ("configuration_id","created_at");--> statement-breakpoint
CREATE INDEX "sweeps_created_by_status_idx" ON "sweeps" USING btree ("created_by","status");--> statement-breakpoint
CREATE INDEX "sweeps_revision_id_idx" ON "sweeps" USING btree ("revision_id");