CREATE TABLE `trip_invites` (
	`id` text PRIMARY KEY NOT NULL,
	`trip_id` text NOT NULL,
	`email` text NOT NULL,
	`role` text NOT NULL,
	`message` text,
	`token_hash` text NOT NULL,
	`invited_by` text,
	`created_at` integer NOT NULL,
	`expires_at` integer NOT NULL,
	`accepted_at` integer,
	`accepted_by` text,
	`revoked_at` integer,
	FOREIGN KEY (`trip_id`) REFERENCES `trips`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`invited_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null,
	FOREIGN KEY (`accepted_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `trip_invites_token_hash_unique` ON `trip_invites` (`token_hash`);--> statement-breakpoint
CREATE INDEX `trip_invites_trip_idx` ON `trip_invites` (`trip_id`);--> statement-breakpoint
CREATE TABLE `club_invites` (
	`id` text PRIMARY KEY NOT NULL,
	`club_id` text NOT NULL,
	`email` text NOT NULL,
	`name` text,
	`token_hash` text NOT NULL,
	`invited_by` text,
	`created_at` integer NOT NULL,
	`expires_at` integer NOT NULL,
	`accepted_at` integer,
	`revoked_at` integer,
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`invited_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE UNIQUE INDEX `club_invites_token_hash_unique` ON `club_invites` (`token_hash`);--> statement-breakpoint
CREATE INDEX `club_invites_club_idx` ON `club_invites` (`club_id`);--> statement-breakpoint
CREATE TABLE `club_members` (
	`club_id` text NOT NULL,
	`user_id` text NOT NULL,
	`role` text NOT NULL,
	`joined_at` integer NOT NULL,
	PRIMARY KEY(`club_id`, `user_id`),
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `club_members_user_idx` ON `club_members` (`user_id`);--> statement-breakpoint
CREATE TABLE `club_trips` (
	`club_id` text NOT NULL,
	`trip_id` text NOT NULL,
	`shared_by` text,
	`shared_at` integer NOT NULL,
	PRIMARY KEY(`club_id`, `trip_id`),
	FOREIGN KEY (`club_id`) REFERENCES `clubs`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`trip_id`) REFERENCES `trips`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`shared_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE INDEX `club_trips_trip_idx` ON `club_trips` (`trip_id`);--> statement-breakpoint
CREATE TABLE `clubs` (
	`id` text PRIMARY KEY NOT NULL,
	`name` text NOT NULL,
	`created_by` text,
	`created_at` integer NOT NULL,
	FOREIGN KEY (`created_by`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE set null
);
--> statement-breakpoint
CREATE TABLE `trip_copies` (
	`copy_trip_id` text PRIMARY KEY NOT NULL,
	`source_trip_id` text NOT NULL,
	`user_id` text NOT NULL,
	`source_route_revision` integer NOT NULL,
	`copied_at` integer NOT NULL,
	FOREIGN KEY (`copy_trip_id`) REFERENCES `trips`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`source_trip_id`) REFERENCES `trips`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `trip_copies_source_idx` ON `trip_copies` (`source_trip_id`);--> statement-breakpoint
ALTER TABLE `trips` ADD `route_revision` integer DEFAULT 1 NOT NULL;