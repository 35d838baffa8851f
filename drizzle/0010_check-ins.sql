CREATE TABLE `check_ins` (
	`id` text PRIMARY KEY NOT NULL,
	`trip_id` text NOT NULL,
	`author_id` text,
	`at` text NOT NULL,
	`at_ms` integer NOT NULL,
	`soc_pct` real NOT NULL,
	`propane` text NOT NULL,
	`harvest_wh` real,
	`note` text DEFAULT '' NOT NULL,
	`created_at` integer NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	FOREIGN KEY (`trip_id`) REFERENCES `trips`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`author_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `check_ins_trip_at_idx` ON `check_ins` (`trip_id`,`at_ms`);