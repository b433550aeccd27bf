-- The live tables belong to a shop like the job they follow: a job's events and who has it open are
-- that job's shop's, found by the job (the column is added empty, filled, and only then refuses none).
ALTER TABLE "job_events" ADD COLUMN "shop_id" integer;--> statement-breakpoint
ALTER TABLE "job_presence" ADD COLUMN "shop_id" integer;--> statement-breakpoint
UPDATE "job_events" SET "shop_id" = "jobs"."shop_id" FROM "jobs" WHERE "jobs"."id" = "job_events"."job_id";--> statement-breakpoint
UPDATE "job_presence" SET "shop_id" = "jobs"."shop_id" FROM "jobs" WHERE "jobs"."id" = "job_presence"."job_id";--> statement-breakpoint
-- A pack's progress names its download's ticket, not its job: the row lives for one download and
-- is made again by the next poll's pack, so the rows of packs under way at the upgrade are let go.
DELETE FROM "pack_progress";--> statement-breakpoint
ALTER TABLE "pack_progress" ADD COLUMN "shop_id" integer;--> statement-breakpoint
ALTER TABLE "job_events" ALTER COLUMN "shop_id" SET DEFAULT nullif(current_setting('borewright.shop_id', true), '')::int;--> statement-breakpoint
ALTER TABLE "job_events" ALTER COLUMN "shop_id" SET NOT NULL;--> statement-breakpoint
ALTER TABLE "job_presence" ALTER COLUMN "shop_id" SET DEFAULT nullif(current_setting('borewright.shop_id', true), '')::int;--> statement-breakpoint
ALTER TABLE "job_presence" ALTER COLUMN "shop_id" SET NOT NULL;--> statement-breakpoint
ALTER TABLE "pack_progress" ALTER COLUMN "shop_id" SET DEFAULT nullif(current_setting('borewright.shop_id', true), '')::int;--> statement-breakpoint
ALTER TABLE "pack_progress" ALTER COLUMN "shop_id" SET NOT NULL;--> statement-breakpoint
ALTER TABLE "job_events" ADD CONSTRAINT "job_events_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "job_presence" ADD CONSTRAINT "job_presence_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pack_progress" ADD CONSTRAINT "pack_progress_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "job_events_shop_idx" ON "job_events" USING btree ("shop_id");--> statement-breakpoint
CREATE INDEX "job_presence_shop_idx" ON "job_presence" USING btree ("shop_id");--> statement-breakpoint
CREATE INDEX "pack_progress_shop_idx" ON "pack_progress" USING btree ("shop_id");--> statement-breakpoint
-- The second wall on them too, as migration 0010 put it on the other shop-owned tables.
ALTER TABLE job_events ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE job_events FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY job_events_shop ON job_events USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);--> statement-breakpoint
ALTER TABLE job_presence ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE job_presence FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY job_presence_shop ON job_presence USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);--> statement-breakpoint
ALTER TABLE pack_progress ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE pack_progress FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY pack_progress_shop ON pack_progress USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);
