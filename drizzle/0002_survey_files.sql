CREATE TYPE "public"."file_category" AS ENUM('photo', 'drawing', 'document');--> statement-breakpoint
CREATE TYPE "public"."file_status" AS ENUM('pending', 'ready');--> statement-breakpoint
CREATE TABLE "project_files" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"status" "file_status" DEFAULT 'pending' NOT NULL,
	"upload_key" text NOT NULL,
	"object_key" text,
	"thumbnail_key" text,
	"original_name" text NOT NULL,
	"content_type" text,
	"category" "file_category" DEFAULT 'photo' NOT NULL,
	"size_bytes" integer,
	"width" integer,
	"height" integer,
	"caption" text DEFAULT '' NOT NULL,
	"scheme_id" uuid,
	"division_id" text,
	"stop_id" text,
	"shared_with_client" boolean DEFAULT false NOT NULL,
	"uploaded_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"completed_at" timestamp with time zone,
	CONSTRAINT "project_files_one_link" CHECK ("project_files"."division_id" is null or "project_files"."stop_id" is null)
);
--> statement-breakpoint
ALTER TABLE "project_files" ADD CONSTRAINT "project_files_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "project_files" ADD CONSTRAINT "project_files_scheme_id_schemes_id_fk" FOREIGN KEY ("scheme_id") REFERENCES "public"."schemes"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "project_files" ADD CONSTRAINT "project_files_uploaded_by_id_users_id_fk" FOREIGN KEY ("uploaded_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "project_files_project_idx" ON "project_files" USING btree ("project_id","status");--> statement-breakpoint
CREATE INDEX "project_files_stop_idx" ON "project_files" USING btree ("scheme_id","stop_id");