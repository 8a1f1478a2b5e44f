CREATE TABLE `installation_checklist_items` (
	`id` text PRIMARY KEY NOT NULL,
	`organisation_id` text NOT NULL,
	`label` text NOT NULL,
	`value_label` text,
	`position` integer NOT NULL,
	`archived_at` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `installation_checklist_items_org_idx` ON `installation_checklist_items` (`organisation_id`);--> statement-breakpoint
CREATE TABLE `installation_links` (
	`id` text PRIMARY KEY NOT NULL,
	`organisation_id` text NOT NULL,
	`installation_record_id` text NOT NULL,
	`token_hash` text NOT NULL,
	`token_hint` text NOT NULL,
	`created_by_user_id` text,
	`expires_at` integer,
	`revoked_at` integer,
	`last_opened_at` integer,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`installation_record_id`) REFERENCES `installation_records`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`created_by_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `installation_links_token_hash_unique` ON `installation_links` (`token_hash`);--> statement-breakpoint
CREATE INDEX `installation_links_record_idx` ON `installation_links` (`installation_record_id`);--> statement-breakpoint
CREATE TABLE `installation_photos` (
	`id` text PRIMARY KEY NOT NULL,
	`organisation_id` text NOT NULL,
	`installation_record_id` text NOT NULL,
	`kind` text NOT NULL,
	`file_name` text NOT NULL,
	`content_type` text NOT NULL,
	`size_bytes` integer NOT NULL,
	`storage_key` text NOT NULL,
	`uploaded_by_user_id` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`installation_record_id`) REFERENCES `installation_records`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`uploaded_by_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `installation_photos_record_idx` ON `installation_photos` (`installation_record_id`);--> statement-breakpoint
CREATE TABLE `installation_records` (
	`id` text PRIMARY KEY NOT NULL,
	`organisation_id` text NOT NULL,
	`units` text NOT NULL,
	`vehicle_profile_id` text,
	`vehicle_description` text NOT NULL,
	`vehicle` text,
	`customer_name` text NOT NULL,
	`customer_email` text,
	`installer_user_id` text,
	`fitted_on` text NOT NULL,
	`state` text DEFAULT 'planned' NOT NULL,
	`hitch` text NOT NULL,
	`parts` text NOT NULL,
	`measurements` text NOT NULL,
	`checklist` text NOT NULL,
	`carrier_depth` real,
	`note` text,
	`applied_to_profile_at` integer,
	`handed_over_at` integer,
	`customer_confirmed_at` integer,
	`created_by_user_id` text,
	`created_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	`updated_at` integer DEFAULT (unixepoch('subsec') * 1000) NOT NULL,
	FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`vehicle_profile_id`) REFERENCES `vehicle_profiles`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`installer_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`created_by_user_id`) REFERENCES `users`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `installation_records_org_date_idx` ON `installation_records` (`organisation_id`,`fitted_on`);--> statement-breakpoint
CREATE INDEX `installation_records_vehicle_idx` ON `installation_records` (`vehicle_profile_id`);--> statement-breakpoint
ALTER TABLE `vehicle_profiles` ADD `figure_sources` text;