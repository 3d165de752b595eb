CREATE TYPE "public"."project_status" AS ENUM('enquiry', 'design', 'tender', 'contracted', 'workshop', 'site', 'complete');--> statement-breakpoint
CREATE TYPE "public"."scheme_status" AS ENUM('draft', 'proposed', 'preferred', 'accepted', 'withdrawn');--> statement-breakpoint
CREATE TABLE "divisions" (
	"scheme_id" uuid NOT NULL,
	"id" text NOT NULL,
	"position" text NOT NULL,
	"name" text NOT NULL,
	"props" jsonb NOT NULL,
	CONSTRAINT "divisions_scheme_id_id_pk" PRIMARY KEY("scheme_id","id")
);
--> statement-breakpoint
CREATE TABLE "project_members" (
	"project_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"added_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "project_members_project_id_user_id_pk" PRIMARY KEY("project_id","user_id")
);
--> statement-breakpoint
CREATE TABLE "projects" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"client_name" text NOT NULL,
	"venue" text DEFAULT '' NOT NULL,
	"location" text DEFAULT '' NOT NULL,
	"instrument" text DEFAULT '' NOT NULL,
	"status" "project_status" DEFAULT 'enquiry' NOT NULL,
	"target_date" date,
	"pitch_hz" double precision DEFAULT 440 NOT NULL,
	"temperature_c" double precision DEFAULT 18 NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"archived_at" timestamp with time zone,
	"created_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "projects_pitch_range" CHECK ("projects"."pitch_hz" between 380 and 480)
);
--> statement-breakpoint
CREATE TABLE "scheme_revisions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"scheme_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"document" jsonb NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"author_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "schemes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"name" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"status" "scheme_status" DEFAULT 'draft' NOT NULL,
	"shared_with_client" boolean DEFAULT false NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"copied_from_id" uuid,
	"accessories" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"updated_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "stops" (
	"scheme_id" uuid NOT NULL,
	"id" text NOT NULL,
	"division_id" text NOT NULL,
	"position" text NOT NULL,
	"name" text NOT NULL,
	"treatment" text NOT NULL,
	"props" jsonb NOT NULL,
	CONSTRAINT "stops_scheme_id_id_pk" PRIMARY KEY("scheme_id","id")
);
--> statement-breakpoint
ALTER TABLE "divisions" ADD CONSTRAINT "divisions_scheme_id_schemes_id_fk" FOREIGN KEY ("scheme_id") REFERENCES "public"."schemes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "project_members" ADD CONSTRAINT "project_members_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "project_members" ADD CONSTRAINT "project_members_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "projects" ADD CONSTRAINT "projects_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "scheme_revisions" ADD CONSTRAINT "scheme_revisions_scheme_id_schemes_id_fk" FOREIGN KEY ("scheme_id") REFERENCES "public"."schemes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "scheme_revisions" ADD CONSTRAINT "scheme_revisions_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "schemes" ADD CONSTRAINT "schemes_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "schemes" ADD CONSTRAINT "schemes_copied_from_id_schemes_id_fk" FOREIGN KEY ("copied_from_id") REFERENCES "public"."schemes"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "schemes" ADD CONSTRAINT "schemes_updated_by_id_users_id_fk" FOREIGN KEY ("updated_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stops" ADD CONSTRAINT "stops_scheme_id_schemes_id_fk" FOREIGN KEY ("scheme_id") REFERENCES "public"."schemes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stops" ADD CONSTRAINT "stops_scheme_id_division_id_divisions_scheme_id_id_fk" FOREIGN KEY ("scheme_id","division_id") REFERENCES "public"."divisions"("scheme_id","id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "divisions_order_idx" ON "divisions" USING btree ("scheme_id","position");--> statement-breakpoint
CREATE UNIQUE INDEX "scheme_revisions_version_key" ON "scheme_revisions" USING btree ("scheme_id","version");--> statement-breakpoint
CREATE INDEX "schemes_project_idx" ON "schemes" USING btree ("project_id");--> statement-breakpoint
CREATE INDEX "stops_order_idx" ON "stops" USING btree ("scheme_id","division_id","position");