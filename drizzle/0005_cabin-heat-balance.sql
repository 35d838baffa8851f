ALTER TABLE `rigs` ADD `cabin_length_m` real DEFAULT 6 NOT NULL;--> statement-breakpoint
ALTER TABLE `rigs` ADD `cabin_width_m` real DEFAULT 2.3 NOT NULL;--> statement-breakpoint
ALTER TABLE `rigs` ADD `cabin_height_m` real DEFAULT 2.1 NOT NULL;--> statement-breakpoint
ALTER TABLE `rigs` ADD `insulation` text DEFAULT 'standard' NOT NULL;--> statement-breakpoint
ALTER TABLE `rigs` ADD `occupants` integer DEFAULT 2 NOT NULL;--> statement-breakpoint
ALTER TABLE `appliances` ADD `thermostat_efficiency` real;--> statement-breakpoint
ALTER TABLE `appliances` ADD `thermostat_capacity_w` real;--> statement-breakpoint
ALTER TABLE `appliances` DROP COLUMN `full_duty_delta_c`;