ALTER TABLE `organisations` ADD `country` text;--> statement-breakpoint
ALTER TABLE `organisations` ADD `region` text;