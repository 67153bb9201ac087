CREATE TABLE "yield_chunk_results" (
	"job_id" uuid NOT NULL,
	"chunk_index" integer NOT NULL,
	"runs" jsonb NOT NULL,
	"finished_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "yield_chunk_results_job_id_chunk_index_pk" PRIMARY KEY("job_id","chunk_index")
);
--> statement-breakpoint
ALTER TABLE "yield_jobs" ADD COLUMN "chunk_count" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "yield_chunk_results" ADD CONSTRAINT "yield_chunk_results_job_id_yield_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."yield_jobs"("id") ON DELETE cascade ON UPDATE no action;