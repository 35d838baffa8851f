ALTER TABLE `drives` ADD `distance_km` real;--> statement-breakpoint
ALTER TABLE `drives` ADD `distance_source` text DEFAULT 'great-circle' NOT NULL;--> statement-breakpoint
ALTER TABLE `drives` ADD `road_factor` real DEFAULT 1.3 NOT NULL;--> statement-breakpoint
ALTER TABLE `drives` ADD `average_speed_kmh` real DEFAULT 70 NOT NULL;--> statement-breakpoint
ALTER TABLE `drives` ADD `hours_source` text DEFAULT 'typed' NOT NULL;