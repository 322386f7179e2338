-- table accounts
CREATE TABLE "accounts" ("id" text primary key, "user_id" text not null references "users" ("id") on delete cascade, "account_id" text not null, "provider_id" text not null, "access_token" text, "refresh_token" text, "id_token" text, "access_token_expires_at" text, "refresh_token_expires_at" text, "scope" text, "password" text, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "updated_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null);

-- index accounts_user_id
CREATE INDEX "accounts_user_id" on "accounts" ("user_id");

-- table audit_log
CREATE TABLE "audit_log" ("id" integer primary key autoincrement, "studio_id" integer not null references "studios" ("id"), "user_id" text references "users" ("id") on delete set null, "action" text not null, "entity" text not null, "entity_id" text not null, "before" text, "after" text, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null);

-- index audit_log_entity
CREATE INDEX "audit_log_entity" on "audit_log" ("studio_id", "entity", "entity_id");

-- table calendar_feeds
CREATE TABLE "calendar_feeds" ("id" integer primary key autoincrement, "studio_id" integer not null references "studios" ("id"), "token_hash" text not null unique, "created_by" text references "users" ("id") on delete set null, "created_at" text not null, "revoked_at" text);

-- index calendar_feeds_studio
CREATE INDEX "calendar_feeds_studio" on "calendar_feeds" ("studio_id");

-- table condition_findings
CREATE TABLE "condition_findings" ("id" integer primary key autoincrement, "report_id" integer not null references "condition_reports" ("id") on delete cascade, "kind" text not null check (kind in ('chip', 'crack', 'hairline-crack', 'crazing', 'glaze-fault', 'loss', 'abrasion', 'stain', 'previous-repair')), "grade" text not null check (grade in ('slight', 'marked', 'serious')), "location" text, "size_mm" integer, "photo_file_id" integer references "files" ("id"), "notes" text);

-- index condition_findings_report
CREATE INDEX "condition_findings_report" on "condition_findings" ("report_id");

-- table condition_reports
CREATE TABLE "condition_reports" ("id" integer primary key autoincrement, "studio_id" integer not null references "studios" ("id"), "work_id" integer not null references "works" ("id"), "consignment_line_id" integer references "consignment_lines" ("id") on delete set null, "stage" text not null check (stage in ('dispatch', 'arrival', 'return', 'claim')), "examiner_name" text not null, "examined_by" text references "users" ("id") on delete set null, "examined_on" text not null, "notes" text, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null);

-- index condition_reports_line
CREATE INDEX "condition_reports_line" on "condition_reports" ("consignment_line_id", "stage");

-- index condition_reports_work
CREATE INDEX "condition_reports_work" on "condition_reports" ("work_id", "examined_on");

-- table consignment_lines
CREATE TABLE "consignment_lines" ("id" integer primary key autoincrement, "studio_id" integer not null references "studios" ("id"), "consignment_id" integer not null references "consignments" ("id") on delete cascade, "work_id" integer not null references "works" ("id"), "currency" text not null, "list_price" integer not null check (list_price >= 0), "insurance_value" integer not null check (insurance_value >= 0), "state" text default 'consigned' not null check (state in ('consigned', 'sold', 'returned', 'damaged', 'lost', 'withdrawn')), "sold_on" text, "sale_price" integer check (sale_price >= 0), "discount" integer check (discount >= 0), "sale_recorded_by" text references "users" ("id") on delete set null, "sale_recorded_at" text, "resolved_on" text, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "updated_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "holds_work" integer, "discount_reason" text, "sale_entered_by" text check (sale_entered_by in ('venue', 'studio')), "sale_mail_id" integer references "outbox" ("id") on delete set null, "resolution_note" text, "resolution_photo_id" integer references "files" ("id"), "resolved_by" text references "users" ("id") on delete set null, "resolved_at" text, "resolution_entered_by" text check (resolution_entered_by in ('venue', 'studio')), constraint "consignment_lines_consignment_work" unique ("consignment_id", "work_id"), constraint "consignment_lines_sale_when_sold" check ((state = 'sold') = (sale_price is not null and sold_on is not null)));

-- index consignment_lines_one_hold_per_work
CREATE UNIQUE INDEX "consignment_lines_one_hold_per_work" on "consignment_lines" ("work_id", "holds_work");

-- index consignment_lines_sale_mail
CREATE INDEX "consignment_lines_sale_mail" on "consignment_lines" ("sale_mail_id");

-- index consignment_lines_sold_on
CREATE INDEX "consignment_lines_sold_on" on "consignment_lines" ("studio_id", "sold_on");

-- index consignment_lines_work
CREATE INDEX "consignment_lines_work" on "consignment_lines" ("work_id", "id");

-- table consignments
CREATE TABLE "consignments" ("id" integer primary key autoincrement, "studio_id" integer not null references "studios" ("id"), "venue_id" integer not null references "venues" ("id"), "reference" text not null, "title" text not null, "state" text default 'draft' not null check (state in ('draft', 'agreed', 'dispatched', 'on-show', 'closed', 'settled', 'cancelled')), "dispatch_date" text, "opening_date" text, "closing_date" text, "return_due_date" text, "terms" text, "agreed_at" text, "notes" text, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "updated_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "dispatched_at" text, "acknowledged_at" text, "acknowledged_by" text references "users" ("id") on delete set null, "cancelled_at" text, "closed_at" text, "settled_at" text, constraint "consignments_studio_reference" unique ("studio_id", "reference"), constraint "consignments_terms_when_agreed" check (state in ('draft', 'cancelled') or terms is not null));

-- index consignments_studio_venue
CREATE INDEX "consignments_studio_venue" on "consignments" ("studio_id", "venue_id");

-- table files
CREATE TABLE "files" ("id" integer primary key autoincrement, "studio_id" integer not null references "studios" ("id"), "sha256" text not null, "mime_type" text not null, "byte_size" integer not null, "original_name" text, "width_px" integer, "height_px" integer, "created_by" text references "users" ("id") on delete set null, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, constraint "files_studio_sha256" unique ("studio_id", "sha256"));

-- table invitations
CREATE TABLE "invitations" ("id" integer primary key autoincrement, "studio_id" integer not null references "studios" ("id"), "email" text not null, "role" text not null check (role in ('owner', 'assistant', 'gallery')), "venue_id" integer references "venues" ("id"), "token_hash" text not null unique, "invited_by" text references "users" ("id") on delete set null, "expires_at" text not null, "accepted_at" text, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, constraint "invitations_venue_for_gallery" check ((role = 'gallery') = (venue_id is not null)));

-- index invitations_email
CREATE INDEX "invitations_email" on "invitations" ("studio_id", "email");

-- table memberships
CREATE TABLE "memberships" ("id" integer primary key autoincrement, "user_id" text not null references "users" ("id") on delete cascade, "studio_id" integer not null references "studios" ("id"), "role" text not null check (role in ('owner', 'assistant', 'gallery')), "venue_id" integer references "venues" ("id"), "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, constraint "memberships_user_studio" unique ("user_id", "studio_id"), constraint "memberships_venue_for_gallery" check ((role = 'gallery') = (venue_id is not null)));

-- table outbox
CREATE TABLE "outbox" ("id" integer primary key autoincrement, "studio_id" integer references "studios" ("id"), "to_address" text not null, "subject" text not null, "text_body" text not null, "html_body" text, "attachments" text default '[]' not null, "state" text default 'queued' not null check (state in ('queued', 'sent', 'failed')), "attempts" integer default 0 not null, "last_error" text, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "sent_at" text, "kind" text default 'other' not null, "next_attempt_at" text default '1970-01-01T00:00:00.000Z' not null, "claimed_until" text, "claim_token" text, "message_id" text, "from_address" text);

-- index outbox_due
CREATE INDEX "outbox_due" on "outbox" ("state", "next_attempt_at");

-- index outbox_state
CREATE INDEX "outbox_state" on "outbox" ("state", "id");

-- index outbox_studio
CREATE INDEX "outbox_studio" on "outbox" ("studio_id", "id");

-- table payments
CREATE TABLE "payments" ("id" integer primary key autoincrement, "studio_id" integer not null references "studios" ("id"), "venue_id" integer not null references "venues" ("id"), "statement_id" integer references "statements" ("id"), "amount" integer not null check (amount > 0), "currency" text not null, "method" text not null check (method in ('bank-transfer', 'cheque', 'cash', 'online')), "state" text default 'received' not null check (state in ('pending', 'received', 'failed', 'refunded')), "received_on" text, "reference" text, "provider_payment_id" text unique, "recorded_by" text references "users" ("id") on delete set null, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "updated_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null);

-- index payments_statement
CREATE INDEX "payments_statement" on "payments" ("statement_id");

-- table sessions
CREATE TABLE "sessions" ("id" text primary key, "user_id" text not null references "users" ("id") on delete cascade, "token" text not null unique, "expires_at" text not null, "ip_address" text, "user_agent" text, "active_membership_id" integer references "memberships" ("id") on delete set null, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "updated_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null);

-- index sessions_user_id
CREATE INDEX "sessions_user_id" on "sessions" ("user_id");

-- table sign_in_limits
CREATE TABLE "sign_in_limits" ("key" text primary key, "hits" integer not null, "window_ends_at" text not null);

-- index sqlite_autoindex_accounts_1
(automatic);

-- index sqlite_autoindex_calendar_feeds_1
(automatic);

-- index sqlite_autoindex_consignment_lines_1
(automatic);

-- index sqlite_autoindex_consignments_1
(automatic);

-- index sqlite_autoindex_files_1
(automatic);

-- index sqlite_autoindex_invitations_1
(automatic);

-- index sqlite_autoindex_kysely_migration_1
(automatic);

-- index sqlite_autoindex_kysely_migration_lock_1
(automatic);

-- index sqlite_autoindex_memberships_1
(automatic);

-- index sqlite_autoindex_payments_1
(automatic);

-- index sqlite_autoindex_sessions_1
(automatic);

-- index sqlite_autoindex_sessions_2
(automatic);

-- index sqlite_autoindex_sign_in_limits_1
(automatic);

-- index sqlite_autoindex_statement_lines_1
(automatic);

-- index sqlite_autoindex_statements_1
(automatic);

-- index sqlite_autoindex_users_1
(automatic);

-- index sqlite_autoindex_users_2
(automatic);

-- index sqlite_autoindex_verifications_1
(automatic);

-- index sqlite_autoindex_work_photos_1
(automatic);

-- index sqlite_autoindex_works_1
(automatic);

-- table sqlite_sequence
CREATE TABLE sqlite_sequence(name,seq);

-- table statement_adjustments
CREATE TABLE "statement_adjustments" ("id" integer primary key autoincrement, "studio_id" integer not null references "studios" ("id"), "statement_id" integer not null references "statements" ("id") on delete cascade, "kind" text not null check (kind in ('unreported-sale', 'discount-not-agreed', 'fee-deducted', 'rounding', 'other')), "amount" integer not null check (amount <> 0), "currency" text not null, "note" text, "created_by" text references "users" ("id") on delete set null, "created_at" text not null);

-- index statement_adjustments_statement
CREATE INDEX "statement_adjustments_statement" on "statement_adjustments" ("statement_id");

-- table statement_lines
CREATE TABLE "statement_lines" ("statement_id" integer not null references "statements" ("id") on delete cascade, "consignment_line_id" integer not null references "consignment_lines" ("id"), "sale_price" integer not null, "commission" integer not null, "vat_on_commission" integer not null, "maker_share" integer not null, constraint "statement_lines_pk" primary key ("statement_id", "consignment_line_id"));

-- index statement_lines_line
CREATE INDEX "statement_lines_line" on "statement_lines" ("consignment_line_id");

-- table statements
CREATE TABLE "statements" ("id" integer primary key autoincrement, "studio_id" integer not null references "studios" ("id"), "venue_id" integer not null references "venues" ("id"), "consignment_id" integer references "consignments" ("id"), "reference" text not null, "period_start" text not null, "period_end" text not null, "state" text default 'draft' not null check (state in ('draft', 'issued', 'settled', 'void')), "currency" text not null, "sales_total" integer, "commission_total" integer, "vat_on_commission_total" integer, "maker_net_total" integer, "issued_at" text, "due_date" text, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "updated_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "output_vat_total" integer, "reclaimable_vat_total" integer, "terms" text, "settled_at" text, constraint "statements_studio_reference" unique ("studio_id", "reference"));

-- table studios
CREATE TABLE "studios" ("id" integer primary key autoincrement, "name" text not null, "country" text default 'GB' not null, "currency" text default 'GBP' not null, "locale" text default 'en-GB' not null, "time_zone" text default 'Europe/London' not null, "vat_number" text, "stock_number_pattern" text default '{YYYY}-{NNN}' not null, "price_step" integer default 500 not null, "default_terms" text, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "updated_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "bank_csv_columns" text);

-- table users
CREATE TABLE "users" ("id" text primary key, "name" text not null, "email" text not null unique, "email_verified" integer default 0 not null, "image" text, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "updated_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null);

-- table venues
CREATE TABLE "venues" ("id" integer primary key autoincrement, "studio_id" integer not null references "studios" ("id"), "name" text not null, "kind" text not null check (kind in ('gallery', 'shop', 'fair', 'exhibition', 'open-studio')), "address_line1" text, "address_line2" text, "town" text, "postcode" text, "country" text, "contact_name" text, "email" text, "phone" text, "vat_number" text, "default_terms" text not null, "notes" text, "archived_at" text, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "updated_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null);

-- index venues_studio_id
CREATE INDEX "venues_studio_id" on "venues" ("studio_id");

-- table verifications
CREATE TABLE "verifications" ("id" text primary key, "identifier" text not null, "value" text not null, "expires_at" text not null, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "updated_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null);

-- table work_photos
CREATE TABLE "work_photos" ("id" integer primary key autoincrement, "work_id" integer not null references "works" ("id") on delete cascade, "file_id" integer not null references "files" ("id"), "position" integer not null, "caption" text, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, constraint "work_photos_work_position" unique ("work_id", "position"));

-- table works
CREATE TABLE "works" ("id" integer primary key autoincrement, "studio_id" integer not null references "studios" ("id"), "stock_number" text not null, "title" text not null, "year" integer, "series" text, "category" text, "clay_body" text, "glaze" text, "firing_temp_c" integer, "atmosphere" text, "kiln" text, "height_mm" integer, "width_mm" integer, "depth_mm" integer, "weight_g" integer, "retail_price" integer not null check (retail_price >= 0), "currency" text not null, "cost_price" integer check (cost_price >= 0), "food_use" text default 'not-stated' not null check (food_use in ('food-safe', 'decorative', 'not-stated')), "care_notes" text, "notes" text, "archived_at" text, "created_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, "updated_at" text default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')) not null, constraint "works_studio_stock_number" unique ("studio_id", "stock_number"));
