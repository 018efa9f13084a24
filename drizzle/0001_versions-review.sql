CREATE TYPE "public"."decision_status" AS ENUM('approved', 'changes-requested');--> statement-breakpoint
CREATE TABLE "coil_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"coil_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"message" text NOT NULL,
	"document" jsonb NOT NULL,
	"draft_revision" integer NOT NULL,
	"summary" jsonb NOT NULL,
	"author_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "coil_versions_coil_number_unique" UNIQUE("coil_id","number")
);
--> statement-breakpoint
CREATE TABLE "share_links" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"version_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"allow_comments" boolean NOT NULL,
	"expires_at" timestamp with time zone,
	"revoked_at" timestamp with time zone,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"first_opened_at" timestamp with time zone,
	"last_opened_at" timestamp with time zone,
	"open_count" integer DEFAULT 0 NOT NULL,
	CONSTRAINT "share_links_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "version_comments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"version_id" uuid NOT NULL,
	"parent_id" uuid,
	"author_id" text,
	"guest_name" text,
	"share_link_id" uuid,
	"body" text NOT NULL,
	"pin" jsonb,
	"resolved_at" timestamp with time zone,
	"resolved_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "version_decisions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"version_id" uuid NOT NULL,
	"status" "decision_status" NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"decided_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "notification_settings" (
	"user_id" text PRIMARY KEY NOT NULL,
	"review_requested" boolean DEFAULT true NOT NULL,
	"new_comment" boolean DEFAULT true NOT NULL,
	"decision" boolean DEFAULT true NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "coil_versions" ADD CONSTRAINT "coil_versions_coil_id_coils_id_fk" FOREIGN KEY ("coil_id") REFERENCES "public"."coils"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "coil_versions" ADD CONSTRAINT "coil_versions_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "share_links" ADD CONSTRAINT "share_links_version_id_coil_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."coil_versions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "share_links" ADD CONSTRAINT "share_links_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "version_comments" ADD CONSTRAINT "version_comments_version_id_coil_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."coil_versions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "version_comments" ADD CONSTRAINT "version_comments_parent_id_version_comments_id_fk" FOREIGN KEY ("parent_id") REFERENCES "public"."version_comments"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "version_comments" ADD CONSTRAINT "version_comments_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "version_comments" ADD CONSTRAINT "version_comments_share_link_id_share_links_id_fk" FOREIGN KEY ("share_link_id") REFERENCES "public"."share_links"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "version_comments" ADD CONSTRAINT "version_comments_resolved_by_users_id_fk" FOREIGN KEY ("resolved_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "version_decisions" ADD CONSTRAINT "version_decisions_version_id_coil_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."coil_versions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "version_decisions" ADD CONSTRAINT "version_decisions_decided_by_users_id_fk" FOREIGN KEY ("decided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notification_settings" ADD CONSTRAINT "notification_settings_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "share_links_version_id_idx" ON "share_links" USING btree ("version_id");--> statement-breakpoint
CREATE INDEX "version_comments_version_id_idx" ON "version_comments" USING btree ("version_id");--> statement-breakpoint
CREATE INDEX "version_decisions_version_id_idx" ON "version_decisions" USING btree ("version_id","created_at");