CREATE TABLE "fit_tests" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"printer_profile_id" uuid NOT NULL,
	"material" text NOT NULL,
	"joint" text NOT NULL,
	"coupon" jsonb NOT NULL,
	"answers" jsonb NOT NULL,
	"best" jsonb NOT NULL,
	"notes" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "fit_tests" ADD CONSTRAINT "fit_tests_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fit_tests" ADD CONSTRAINT "fit_tests_printer_profile_id_printer_profiles_id_fk" FOREIGN KEY ("printer_profile_id") REFERENCES "public"."printer_profiles"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fit_tests" ADD CONSTRAINT "fit_tests_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "fit_tests_profile_created_idx" ON "fit_tests" USING btree ("printer_profile_id","created_at");