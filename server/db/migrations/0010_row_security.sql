-- The second wall (server/db/README.md, Row-level security): the app's shop queries run as
-- borewright_app, which is neither a superuser nor the tables' owner, and every shop-owned table lets it
-- see and write only the rows of the transaction's borewright.shop_id (none while it is unset).
DO $$ BEGIN
  IF NOT EXISTS (SELECT FROM pg_roles WHERE rolname = 'borewright_app') THEN CREATE ROLE borewright_app NOLOGIN; END IF;
END $$;--> statement-breakpoint
-- The connecting role runs the migrations and switches to the app's role (SET ROLE) for shop work.
GRANT borewright_app TO CURRENT_USER;--> statement-breakpoint
GRANT USAGE ON SCHEMA public TO borewright_app;--> statement-breakpoint
GRANT SELECT, INSERT, UPDATE, DELETE ON ALL TABLES IN SCHEMA public TO borewright_app;--> statement-breakpoint
GRANT USAGE, SELECT ON ALL SEQUENCES IN SCHEMA public TO borewright_app;--> statement-breakpoint
-- Shops are made and suspended by the operator, through the connecting role; a shop only reads its own row.
REVOKE INSERT, UPDATE, DELETE ON shops FROM borewright_app;--> statement-breakpoint
ALTER DEFAULT PRIVILEGES IN SCHEMA public GRANT SELECT, INSERT, UPDATE, DELETE ON TABLES TO borewright_app;--> statement-breakpoint
ALTER DEFAULT PRIVILEGES IN SCHEMA public GRANT USAGE, SELECT ON SEQUENCES TO borewright_app;--> statement-breakpoint
ALTER TABLE shops ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE shops FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY shops_own ON shops USING (id = nullif(current_setting('borewright.shop_id', true), '')::int);--> statement-breakpoint
ALTER TABLE users ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE users FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY users_shop ON users USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);--> statement-breakpoint
ALTER TABLE jobs ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE jobs FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY jobs_shop ON jobs USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);--> statement-breakpoint
ALTER TABLE carcasses ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE carcasses FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY carcasses_shop ON carcasses USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);--> statement-breakpoint
ALTER TABLE panels ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE panels FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY panels_shop ON panels USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);--> statement-breakpoint
ALTER TABLE placements ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE placements FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY placements_shop ON placements USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);--> statement-breakpoint
ALTER TABLE bores ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE bores FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY bores_shop ON bores USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);--> statement-breakpoint
ALTER TABLE activity ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE activity FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY activity_shop ON activity USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);--> statement-breakpoint
ALTER TABLE attachments ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE attachments FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY attachments_shop ON attachments USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);--> statement-breakpoint
ALTER TABLE shop_fittings ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE shop_fittings FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY shop_fittings_shop ON shop_fittings USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);--> statement-breakpoint
ALTER TABLE shop_settings ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE shop_settings FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY shop_settings_shop ON shop_settings USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);--> statement-breakpoint
ALTER TABLE mail_tokens ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE mail_tokens FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY mail_tokens_shop ON mail_tokens USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);--> statement-breakpoint
ALTER TABLE outbox ENABLE ROW LEVEL SECURITY;--> statement-breakpoint
ALTER TABLE outbox FORCE ROW LEVEL SECURITY;--> statement-breakpoint
CREATE POLICY outbox_shop ON outbox USING (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int) WITH CHECK (shop_id = nullif(current_setting('borewright.shop_id', true), '')::int);
