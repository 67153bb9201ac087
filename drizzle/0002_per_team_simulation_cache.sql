-- Answers cached before they were kept per team have no owner: drop them.
DELETE FROM "simulation_cache";--> statement-breakpoint
ALTER TABLE "simulation_cache" ADD COLUMN "team_id" uuid;--> statement-breakpoint
ALTER TABLE "simulation_cache" ADD COLUMN "used_at" timestamp with time zone DEFAULT now() NOT NULL;--> statement-breakpoint
ALTER TABLE "simulation_cache" ADD CONSTRAINT "simulation_cache_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "simulation_cache_team_used_idx" ON "simulation_cache" USING btree ("team_id","used_at");