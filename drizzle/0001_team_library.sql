CREATE TABLE "printer_profiles" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"process" text NOT NULL,
	"build_x" double precision NOT NULL,
	"build_y" double precision NOT NULL,
	"build_z" double precision NOT NULL,
	"nozzle_diameter" double precision,
	"layer_height" double precision NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"calibration" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_by" uuid
);
--> statement-breakpoint
CREATE TABLE "team_materials" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"base_material" text NOT NULL,
	"shrinkage_percent" double precision,
	"clearance_adjustments" jsonb NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_by" uuid
);
--> statement-breakpoint
CREATE TABLE "presets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"tags" text[] DEFAULT '{}' NOT NULL,
	"printer_profile_id" uuid,
	"version" integer DEFAULT 1 NOT NULL,
	"schema_version" integer NOT NULL,
	"settings" jsonb NOT NULL,
	"archived" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"created_by" uuid,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_by" uuid
);
--> statement-breakpoint
CREATE TABLE "preset_versions" (
	"preset_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"name" text NOT NULL,
	"description" text NOT NULL,
	"tags" text[] NOT NULL,
	"printer_profile_id" uuid,
	"schema_version" integer NOT NULL,
	"settings" jsonb NOT NULL,
	"changes" jsonb NOT NULL,
	"restored_from" integer,
	"author_id" uuid,
	"author_name" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "preset_versions_preset_id_version_pk" PRIMARY KEY("preset_id","version")
);
--> statement-breakpoint
CREATE TABLE "kit_downloads" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"user_id" uuid,
	"user_name" text,
	"preset_id" uuid,
	"preset_name" text,
	"preset_version" integer,
	"printer_profile_id" uuid,
	"printer_profile_name" text,
	"calibration" jsonb,
	"request" jsonb NOT NULL,
	"summary" jsonb NOT NULL,
	"files" jsonb NOT NULL,
	"file_name" text NOT NULL,
	"engine_version" text NOT NULL,
	"zip" "bytea" NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "printer_profiles" ADD CONSTRAINT "printer_profiles_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "printer_profiles" ADD CONSTRAINT "printer_profiles_updated_by_users_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "team_materials" ADD CONSTRAINT "team_materials_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "team_materials" ADD CONSTRAINT "team_materials_updated_by_users_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "presets" ADD CONSTRAINT "presets_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "presets" ADD CONSTRAINT "presets_printer_profile_id_printer_profiles_id_fk" FOREIGN KEY ("printer_profile_id") REFERENCES "public"."printer_profiles"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "presets" ADD CONSTRAINT "presets_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "presets" ADD CONSTRAINT "presets_updated_by_users_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "preset_versions" ADD CONSTRAINT "preset_versions_preset_id_presets_id_fk" FOREIGN KEY ("preset_id") REFERENCES "public"."presets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "preset_versions" ADD CONSTRAINT "preset_versions_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kit_downloads" ADD CONSTRAINT "kit_downloads_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kit_downloads" ADD CONSTRAINT "kit_downloads_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kit_downloads" ADD CONSTRAINT "kit_downloads_preset_id_presets_id_fk" FOREIGN KEY ("preset_id") REFERENCES "public"."presets"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "kit_downloads" ADD CONSTRAINT "kit_downloads_printer_profile_id_printer_profiles_id_fk" FOREIGN KEY ("printer_profile_id") REFERENCES "public"."printer_profiles"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "printer_profiles_team_name_idx" ON "printer_profiles" USING btree ("team_id",lower("name"));--> statement-breakpoint
CREATE INDEX "printer_profiles_team_updated_idx" ON "printer_profiles" USING btree ("team_id","updated_at");--> statement-breakpoint
CREATE UNIQUE INDEX "team_materials_team_name_idx" ON "team_materials" USING btree ("team_id",lower("name"));--> statement-breakpoint
CREATE UNIQUE INDEX "presets_team_name_idx" ON "presets" USING btree ("team_id",lower("name"));--> statement-breakpoint
CREATE INDEX "presets_team_updated_idx" ON "presets" USING btree ("team_id","updated_at");--> statement-breakpoint
CREATE INDEX "kit_downloads_team_created_idx" ON "kit_downloads" USING btree ("team_id","created_at");