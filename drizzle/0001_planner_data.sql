CREATE TABLE `rigs` (
	`id` text PRIMARY KEY NOT NULL,
	`owner_id` text NOT NULL,
	`trip_id` text,
	`name` text NOT NULL,
	`chemistry` text NOT NULL,
	`capacity_ah` real NOT NULL,
	`nominal_v` real NOT NULL,
	`reserve_pct` real,
	`initial_soc_pct` real NOT NULL,
	`heated_space` integer NOT NULL,
	`solar_arrays` text NOT NULL,
	`controller` text,
	`inverter` text,
	`shore_charger` text,
	`vehicle_charger` text,
	`generator` text,
	`propane_tanks` text NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	`created_at` integer NOT NULL,
	`updated_at` integer NOT NULL,
	FOREIGN KEY (`owner_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`trip_id`) REFERENCES `trips`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `rigs_owner_idx` ON `rigs` (`owner_id`);--> statement-breakpoint
CREATE INDEX `rigs_trip_idx` ON `rigs` (`trip_id`);--> statement-breakpoint
CREATE TABLE `stops` (
	`id` text PRIMARY KEY NOT NULL,
	`trip_id` text NOT NULL,
	`position` integer NOT NULL,
	`name` text NOT NULL,
	`lat` real NOT NULL,
	`lon` real NOT NULL,
	`elevation_m` real NOT NULL,
	`time_zone` text NOT NULL,
	`arrive_at` text NOT NULL,
	`depart_at` text NOT NULL,
	`exposure` text NOT NULL,
	`sky_outlook` text NOT NULL,
	`linke_turbidity` real,
	`hookup_amps` real,
	`hookup_volts` real,
	`generator_start_hour` integer,
	`generator_end_hour` integer,
	`low_c` real NOT NULL,
	`high_c` real NOT NULL,
	`notes` text DEFAULT '' NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	FOREIGN KEY (`trip_id`) REFERENCES `trips`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `stops_trip_idx` ON `stops` (`trip_id`);--> statement-breakpoint
CREATE UNIQUE INDEX `stops_trip_position_idx` ON `stops` (`trip_id`,`position`);--> statement-breakpoint
CREATE TABLE `drives` (
	`id` text PRIMARY KEY NOT NULL,
	`trip_id` text NOT NULL,
	`position` integer NOT NULL,
	`hours_on_road` real NOT NULL,
	`vehicle_charging` integer NOT NULL,
	`version` integer DEFAULT 1 NOT NULL,
	FOREIGN KEY (`trip_id`) REFERENCES `trips`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE UNIQUE INDEX `drives_trip_position_idx` ON `drives` (`trip_id`,`position`);--> statement-breakpoint
CREATE TABLE `appliances` (
	`id` text PRIMARY KEY NOT NULL,
	`trip_id` text NOT NULL,
	`position` integer NOT NULL,
	`name` text NOT NULL,
	`circuit` text NOT NULL,
	`quantity` integer NOT NULL,
	`running_w` real NOT NULL,
	`standby_w` real NOT NULL,
	`duty_cycle` real NOT NULL,
	`surge_w` real,
	`heat_input_w` real NOT NULL,
	`schedule_kind` text NOT NULL,
	`thermostat_mode` text,
	`set_point_c` real,
	`full_duty_delta_c` real,
	`caretaker_user_id` text,
	`version` integer DEFAULT 1 NOT NULL,
	FOREIGN KEY (`trip_id`) REFERENCES `trips`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`caretaker_user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `appliances_trip_idx` ON `appliances` (`trip_id`);--> statement-breakpoint
CREATE TABLE `routine_windows` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`appliance_id` text NOT NULL,
	`position` integer NOT NULL,
	`days` text NOT NULL,
	`start_hour` integer NOT NULL,
	`start_minute` integer NOT NULL,
	`minutes` integer NOT NULL,
	FOREIGN KEY (`appliance_id`) REFERENCES `appliances`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `routine_windows_appliance_idx` ON `routine_windows` (`appliance_id`);--> statement-breakpoint
CREATE TABLE `memberships` (
	`trip_id` text NOT NULL,
	`user_id` text NOT NULL,
	`role` text NOT NULL,
	`created_at` integer NOT NULL,
	PRIMARY KEY(`trip_id`, `user_id`),
	FOREIGN KEY (`trip_id`) REFERENCES `trips`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `memberships_user_idx` ON `memberships` (`user_id`);--> statement-breakpoint
CREATE TABLE `activity` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`trip_id` text NOT NULL,
	`user_id` text,
	`at` integer NOT NULL,
	`summary` text NOT NULL,
	FOREIGN KEY (`trip_id`) REFERENCES `trips`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `activity_trip_idx` ON `activity` (`trip_id`,`at`);--> statement-breakpoint
CREATE TABLE `preferences` (
	`user_id` text PRIMARY KEY NOT NULL,
	`units` text DEFAULT 'metric' NOT NULL,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
ALTER TABLE `trips` ADD `notes` text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE `trips` ADD `revision` integer DEFAULT 1 NOT NULL;