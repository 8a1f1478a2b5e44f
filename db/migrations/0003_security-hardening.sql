ALTER TABLE `organisations` ADD `link_lifetime_days` integer DEFAULT 180 NOT NULL;--> statement-breakpoint
-- Sessions are now stored by the hash of their id: the old rows open nothing, and SQLite adds a column
-- with a computed default only to an empty table. Everyone signs in again once.
DELETE FROM `sessions`;--> statement-breakpoint
ALTER TABLE `sessions` ADD `created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL;--> statement-breakpoint
-- A pending sign-up no longer carries a password: it is chosen on the confirmation page.
ALTER TABLE `signup_requests` DROP COLUMN `password_hash`;