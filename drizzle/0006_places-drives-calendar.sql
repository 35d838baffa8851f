CREATE TABLE `calendar_feeds` (
	`id` text PRIMARY KEY NOT NULL,
	`trip_id` text NOT NULL,
	`user_id` text NOT NULL,
	`token_hash` text NOT NULL,
	`created_at` integer NOT NULL,
	`last_fetched_at` integer,
	`revoked_at` integer,
	FOREIGN KEY (`trip_id`) REFERENCES `trips`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `calendar_feeds_token_hash_unique` ON `calendar_feeds` (`token_hash`);--> statement-breakpoint
CREATE INDEX `calendar_feeds_trip_user_idx` ON `calendar_feeds` (`trip_id`,`user_id`);--> statement-breakpoint
ALTER TABLE `drives` ADD `distance_km` real;--> statement-breakpoint
ALTER TABLE `drives` ADD `distance_source` text DEFAULT 'great-circle' NOT NULL;--> statement-breakpoint
ALTER TABLE `drives` ADD `road_factor` real DEFAULT 1.3 NOT NULL;--> statement-breakpoint
ALTER TABLE `drives` ADD `average_speed_kmh` real DEFAULT 70 NOT NULL;--> statement-breakpoint
ALTER TABLE `drives` ADD `hours_source` text DEFAULT 'typed' NOT NULL;