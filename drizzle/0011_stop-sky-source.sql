ALTER TABLE `stops` ADD `sky_source` text DEFAULT 'record' NOT NULL;--> statement-breakpoint
ALTER TABLE `stops` ADD `own_temperatures` integer DEFAULT false NOT NULL;