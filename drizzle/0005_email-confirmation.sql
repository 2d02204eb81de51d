CREATE TABLE `email_confirmations` (
	`id` varchar(36) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`token_hash` char(64) CHARACTER SET ascii COLLATE ascii_bin NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`used_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `email_confirmations_id` PRIMARY KEY(`id`),
	CONSTRAINT `email_confirmations_token_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
ALTER TABLE `users` ADD `email_confirmed_at` datetime(3);--> statement-breakpoint
ALTER TABLE `email_confirmations` ADD CONSTRAINT `email_confirmations_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `email_confirmations_user_idx` ON `email_confirmations` (`user_id`);--> statement-breakpoint
-- Accounts made before confirmation existed keep mailing as before.
UPDATE `users` SET `email_confirmed_at` = `created_at` WHERE `email_confirmed_at` IS NULL;
