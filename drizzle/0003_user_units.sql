CREATE TYPE "public"."length_unit" AS ENUM('mm', 'in');--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "units" "length_unit" DEFAULT 'mm' NOT NULL;