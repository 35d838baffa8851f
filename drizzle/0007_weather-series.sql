CREATE TABLE `weather_series` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`lat_e1` integer NOT NULL,
	`lon_e1` integer NOT NULL,
	`start_date` text NOT NULL,
	`end_date` text NOT NULL,
	`source` text NOT NULL,
	`status` text NOT NULL,
	`attempts` integer DEFAULT 0 NOT NULL,
	`next_attempt_at` integer NOT NULL,
	`fetched_at` integer,
	`ghi_wm2` text,
	`temp_c` text,
	`last_error` text
);
--> statement-breakpoint
CREATE UNIQUE INDEX `weather_series_key_idx` ON `weather_series` (`lat_e1`,`lon_e1`,`start_date`,`end_date`,`source`);--> statement-breakpoint
CREATE INDEX `weather_series_queue_idx` ON `weather_series` (`status`,`next_attempt_at`);