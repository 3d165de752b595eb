CREATE TYPE "public"."quote_status" AS ENUM('draft', 'issued', 'accepted', 'declined');--> statement-breakpoint
CREATE TABLE "quotations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"scheme_id" uuid,
	"scheme_version" integer NOT NULL,
	"rate_set_version_id" uuid,
	"number" text NOT NULL,
	"status" "quote_status" DEFAULT 'draft' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"commercial" jsonb NOT NULL,
	"snapshot" jsonb,
	"valid_until" date,
	"issued_at" timestamp with time zone,
	"issued_by_id" uuid,
	"decided_at" timestamp with time zone,
	"sent_at" timestamp with time zone,
	"created_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "quote_counters" (
	"year" integer PRIMARY KEY NOT NULL,
	"last" integer NOT NULL
);
--> statement-breakpoint
CREATE TABLE "rate_set_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"rate_set_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"effective_date" date NOT NULL,
	"rates" jsonb NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"author_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "rate_sets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"is_current" boolean DEFAULT false NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "firms" ADD COLUMN "website" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "firms" ADD COLUMN "registration" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "firms" ADD COLUMN "logo_png" text;--> statement-breakpoint
ALTER TABLE "firms" ADD COLUMN "logo_width" integer;--> statement-breakpoint
ALTER TABLE "firms" ADD COLUMN "logo_height" integer;--> statement-breakpoint
ALTER TABLE "firms" ADD COLUMN "version" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "firms" ADD COLUMN "updated_at" timestamp with time zone DEFAULT now() NOT NULL;--> statement-breakpoint
ALTER TABLE "quotations" ADD CONSTRAINT "quotations_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotations" ADD CONSTRAINT "quotations_scheme_id_schemes_id_fk" FOREIGN KEY ("scheme_id") REFERENCES "public"."schemes"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotations" ADD CONSTRAINT "quotations_rate_set_version_id_rate_set_versions_id_fk" FOREIGN KEY ("rate_set_version_id") REFERENCES "public"."rate_set_versions"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotations" ADD CONSTRAINT "quotations_issued_by_id_users_id_fk" FOREIGN KEY ("issued_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotations" ADD CONSTRAINT "quotations_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rate_set_versions" ADD CONSTRAINT "rate_set_versions_rate_set_id_rate_sets_id_fk" FOREIGN KEY ("rate_set_id") REFERENCES "public"."rate_sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rate_set_versions" ADD CONSTRAINT "rate_set_versions_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "quotations_number_key" ON "quotations" USING btree ("number");--> statement-breakpoint
CREATE INDEX "quotations_project_idx" ON "quotations" USING btree ("project_id");--> statement-breakpoint
CREATE UNIQUE INDEX "rate_set_versions_version_key" ON "rate_set_versions" USING btree ("rate_set_id","version");--> statement-breakpoint
CREATE UNIQUE INDEX "rate_sets_name_key" ON "rate_sets" USING btree ("name");--> statement-breakpoint
CREATE UNIQUE INDEX "rate_sets_one_current" ON "rate_sets" USING btree ("is_current") WHERE "rate_sets"."is_current";