CREATE TABLE `invite_mailings` (
	`id` integer PRIMARY KEY AUTOINCREMENT NOT NULL,
	`user_id` text NOT NULL,
	`at` integer NOT NULL,
	FOREIGN KEY (`user_id`) REFERENCES `user`(`id`) ON UPDATE no action ON DELETE cascade
);
--> statement-breakpoint
CREATE INDEX `invite_mailings_user_at_idx` ON `invite_mailings` (`user_id`,`at`);--> statement-breakpoint
ALTER TABLE `activity` ADD `audience` text DEFAULT 'everyone' NOT NULL;--> statement-breakpoint
ALTER TABLE `trip_invites` ADD `mail_failed_at` integer;--> statement-breakpoint
ALTER TABLE `club_invites` ADD `mail_failed_at` integer;