CREATE TABLE `learned_rates` (
	`shop_id` varchar(36) NOT NULL,
	`stone_id` varchar(36) NOT NULL,
	`bore_material` enum('grey_iron','cgi','ductile_iron','al_iron_liner','steel_liner','hypereutectic_al','coated') NOT NULL,
	`machine_id` varchar(36) NOT NULL,
	`rate_version` int NOT NULL,
	`sequence` int NOT NULL DEFAULT 0,
	`state` json NOT NULL,
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `learned_rates_pk` PRIMARY KEY(`shop_id`,`stone_id`,`bore_material`,`machine_id`)
);
--> statement-breakpoint
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
ALTER TABLE `shop_settings` ADD `max_temperature_difference_k` decimal(4,1) DEFAULT 2 NOT NULL;--> statement-breakpoint
ALTER TABLE `shop_settings` ADD `gauge_temperature_c` decimal(4,1);--> statement-breakpoint
ALTER TABLE `final_inspections` ADD `surface_report_id` varchar(36);--> statement-breakpoint
ALTER TABLE `runs` ADD `learning` json;--> statement-breakpoint
ALTER TABLE `learned_rates` ADD CONSTRAINT `learned_rates_shop_id_shops_id_fk` FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `learned_rates` ADD CONSTRAINT `learned_rates_stone_id_stones_id_fk` FOREIGN KEY (`stone_id`) REFERENCES `stones`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `learned_rates` ADD CONSTRAINT `learned_rates_machine_id_machines_id_fk` FOREIGN KEY (`machine_id`) REFERENCES `machines`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `record_links` ADD CONSTRAINT `record_links_job_id_jobs_id_fk` FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `record_links` ADD CONSTRAINT `record_links_version_id_record_versions_id_fk` FOREIGN KEY (`version_id`) REFERENCES `record_versions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `record_versions` ADD CONSTRAINT `record_versions_job_id_jobs_id_fk` FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `record_links_shop_job_idx` ON `record_links` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE INDEX `record_versions_shop_job_idx` ON `record_versions` (`shop_id`,`job_id`);