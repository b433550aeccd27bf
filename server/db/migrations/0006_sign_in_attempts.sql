CREATE TABLE "sign_in_addresses" (
	"email" text NOT NULL,
	"address" text NOT NULL,
	"last_at" timestamp with time zone NOT NULL,
	CONSTRAINT "sign_in_addresses_email_address_pk" PRIMARY KEY("email","address")
);
--> statement-breakpoint
CREATE TABLE "sign_in_attempts" (
	"key" text PRIMARY KEY NOT NULL,
	"failures" integer DEFAULT 0 NOT NULL,
	"window_start" timestamp with time zone NOT NULL,
	"next_at" timestamp with time zone NOT NULL
);
--> statement-breakpoint
CREATE INDEX "sign_in_addresses_last_idx" ON "sign_in_addresses" USING btree ("last_at");--> statement-breakpoint
CREATE INDEX "sign_in_attempts_window_idx" ON "sign_in_attempts" USING btree ("window_start");