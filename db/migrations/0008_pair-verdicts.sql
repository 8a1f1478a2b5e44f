CREATE TABLE `pair_rechecks` (
	`organisation_id` text PRIMARY KEY NOT NULL,
	`fingerprint` text NOT NULL,
	`status` text NOT NULL,
	`claim` text,
	`claimed_at` integer,
	FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE TABLE `pair_verdicts` (
	`organisation_id` text NOT NULL,
	`vehicle_id` text NOT NULL,
	`hitched_id` text NOT NULL,
	`level` text NOT NULL,
	`cell` text NOT NULL,
	`inputs` text NOT NULL,
	PRIMARY KEY(`organisation_id`, `vehicle_id`, `hitched_id`),
	FOREIGN KEY (`organisation_id`) REFERENCES `organisations`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `pair_verdicts_level_idx` ON `pair_verdicts` (`organisation_id`,`level`,`vehicle_id`,`hitched_id`);