CREATE TABLE `record_links` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`job_id` varchar(36) NOT NULL,
	`version_id` varchar(36) NOT NULL,
	`token_hash` char(64) CHARACTER SET ascii COLLATE ascii_bin NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`revoked_at` datetime(3),
	`revoked_by` varchar(36),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `record_links_id` PRIMARY KEY(`id`),
	CONSTRAINT `record_links_token_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `record_settings` (
	`shop_id` varchar(36) NOT NULL,
	`address` varchar(400) NOT NULL DEFAULT '',
	`contact` varchar(200) NOT NULL DEFAULT '',
	`remarks` varchar(2000) NOT NULL,
	`logo_stored_name` varchar(80),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `record_settings_shop_id` PRIMARY KEY(`shop_id`)
);
--> statement-breakpoint
CREATE TABLE `record_versions` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`job_id` varchar(36) NOT NULL,
	`version` int NOT NULL,
	`unit_system` enum('metric','inch') NOT NULL,
	`data` json NOT NULL,
	`pdf_stored_name` varchar(80) NOT NULL,
	`pdf_bytes` int NOT NULL,
	`sent_to` varchar(254) NOT NULL,
	`sent_by` varchar(36) NOT NULL,
	`sent_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `record_versions_id` PRIMARY KEY(`id`),
	CONSTRAINT `record_versions_job_version_unique` UNIQUE(`job_id`,`version`)
);
--> statement-breakpoint
ALTER TABLE `email_outbox` ADD `attachments` json;--> statement-breakpoint
ALTER TABLE `record_links` ADD CONSTRAINT `record_links_job_id_jobs_id_fk` FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `record_links` ADD CONSTRAINT `record_links_version_id_record_versions_id_fk` FOREIGN KEY (`version_id`) REFERENCES `record_versions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `record_versions` ADD CONSTRAINT `record_versions_job_id_jobs_id_fk` FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `record_links_shop_job_idx` ON `record_links` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE INDEX `record_versions_shop_job_idx` ON `record_versions` (`shop_id`,`job_id`);