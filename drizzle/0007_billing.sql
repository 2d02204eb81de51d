CREATE TABLE `billing_settings` (
	`shop_id` varchar(36) NOT NULL,
	`currency` varchar(3) NOT NULL DEFAULT 'EUR',
	`currency_digits` int NOT NULL DEFAULT 2,
	`payment_terms_days` int NOT NULL DEFAULT 30,
	`payment_terms_note` varchar(300) NOT NULL DEFAULT '',
	`invoice_prefix` varchar(12) NOT NULL DEFAULT 'INV-',
	`last_invoice_number` int NOT NULL DEFAULT 0,
	`cylinder_set_up_min` decimal(6,1) NOT NULL DEFAULT 5,
	`stone_change_min` decimal(6,1) NOT NULL DEFAULT 2,
	`job_set_up_min` decimal(6,1) NOT NULL DEFAULT 15,
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `billing_settings_shop_id` PRIMARY KEY(`shop_id`)
);
--> statement-breakpoint
CREATE TABLE `invoice_lines` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`position` int NOT NULL,
	`source` enum('plan','work','manual') NOT NULL,
	`description` varchar(200) NOT NULL,
	`quantity_milli` int NOT NULL,
	`unit_price_minor` bigint NOT NULL,
	`tax_rate_bp` int NOT NULL,
	`net_minor` bigint NOT NULL,
	`invoice_id` varchar(36) NOT NULL,
	CONSTRAINT `invoice_lines_id` PRIMARY KEY(`id`),
	CONSTRAINT `invoice_lines_pos_unique` UNIQUE(`invoice_id`,`position`)
);
--> statement-breakpoint
CREATE TABLE `invoices` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`job_id` varchar(36) NOT NULL,
	`status` enum('draft','issued','paid','void') NOT NULL DEFAULT 'draft',
	`number` int,
	`number_text` varchar(24),
	`customer_name` varchar(120) NOT NULL,
	`customer_email` varchar(254) NOT NULL DEFAULT '',
	`note` varchar(2000) NOT NULL DEFAULT '',
	`currency` varchar(3) NOT NULL,
	`currency_digits` int NOT NULL DEFAULT 2,
	`net_minor` bigint NOT NULL DEFAULT 0,
	`tax_minor` bigint NOT NULL DEFAULT 0,
	`total_minor` bigint NOT NULL DEFAULT 0,
	`taxes` json NOT NULL,
	`version` int NOT NULL DEFAULT 1,
	`issued_at` datetime(3),
	`issued_by` varchar(36),
	`due_at` datetime(3),
	`paid_at` datetime(3),
	`void_reason` varchar(500),
	`voided_at` datetime(3),
	`voided_by` varchar(36),
	`checkout_session_id` varchar(255),
	`checkout_url` varchar(2000),
	`created_by` varchar(36) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `invoices_id` PRIMARY KEY(`id`),
	CONSTRAINT `invoices_shop_number_unique` UNIQUE(`shop_id`,`number`),
	CONSTRAINT `invoices_checkout_session_unique` UNIQUE(`checkout_session_id`)
);
--> statement-breakpoint
CREATE TABLE `payments` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`invoice_id` varchar(36) NOT NULL,
	`provider` varchar(20) NOT NULL,
	`provider_event_id` varchar(255) NOT NULL,
	`provider_session_id` varchar(255) NOT NULL,
	`provider_payment_id` varchar(255),
	`amount_minor` bigint NOT NULL,
	`currency` varchar(3) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `payments_id` PRIMARY KEY(`id`),
	CONSTRAINT `payments_provider_event_unique` UNIQUE(`provider`,`provider_event_id`)
);
--> statement-breakpoint
CREATE TABLE `price_items` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`kind` enum('boring','honing','plateau','torque_plate','machine_hour','labour_hour','part','other') NOT NULL,
	`name` varchar(120) NOT NULL,
	`unit_price_minor` bigint NOT NULL,
	`tax_rate_id` varchar(36),
	`archived_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `price_items_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `quote_lines` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`position` int NOT NULL,
	`source` enum('plan','work','manual') NOT NULL,
	`description` varchar(200) NOT NULL,
	`quantity_milli` int NOT NULL,
	`unit_price_minor` bigint NOT NULL,
	`tax_rate_bp` int NOT NULL,
	`net_minor` bigint NOT NULL,
	`quote_id` varchar(36) NOT NULL,
	CONSTRAINT `quote_lines_id` PRIMARY KEY(`id`),
	CONSTRAINT `quote_lines_pos_unique` UNIQUE(`quote_id`,`position`)
);
--> statement-breakpoint
CREATE TABLE `quotes` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`job_id` varchar(36),
	`quick_request` json,
	`status` enum('draft','sent','accepted','declined') NOT NULL DEFAULT 'draft',
	`customer_name` varchar(120) NOT NULL,
	`customer_email` varchar(254) NOT NULL,
	`note` varchar(2000) NOT NULL DEFAULT '',
	`currency` varchar(3) NOT NULL,
	`net_minor` bigint NOT NULL DEFAULT 0,
	`tax_minor` bigint NOT NULL DEFAULT 0,
	`total_minor` bigint NOT NULL DEFAULT 0,
	`estimated_minutes` decimal(9,1),
	`accept_token_hash` char(64) CHARACTER SET ascii COLLATE ascii_bin,
	`token_expires_at` datetime(3),
	`sent_at` datetime(3),
	`decided_at` datetime(3),
	`booked_job_id` varchar(36),
	`created_by` varchar(36) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `quotes_id` PRIMARY KEY(`id`),
	CONSTRAINT `quotes_accept_token_unique` UNIQUE(`accept_token_hash`)
);
--> statement-breakpoint
CREATE TABLE `tax_rates` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`name` varchar(60) NOT NULL,
	`rate_bp` int NOT NULL,
	`archived_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `tax_rates_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `invoice_lines` ADD CONSTRAINT `invoice_lines_invoice_id_invoices_id_fk` FOREIGN KEY (`invoice_id`) REFERENCES `invoices`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invoices` ADD CONSTRAINT `invoices_job_id_jobs_id_fk` FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `payments` ADD CONSTRAINT `payments_invoice_id_invoices_id_fk` FOREIGN KEY (`invoice_id`) REFERENCES `invoices`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `quote_lines` ADD CONSTRAINT `quote_lines_quote_id_quotes_id_fk` FOREIGN KEY (`quote_id`) REFERENCES `quotes`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `quotes` ADD CONSTRAINT `quotes_job_id_jobs_id_fk` FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `invoices_shop_status_idx` ON `invoices` (`shop_id`,`status`);--> statement-breakpoint
CREATE INDEX `invoices_job_idx` ON `invoices` (`job_id`);--> statement-breakpoint
CREATE INDEX `payments_invoice_idx` ON `payments` (`invoice_id`);--> statement-breakpoint
CREATE INDEX `price_items_shop_kind_idx` ON `price_items` (`shop_id`,`kind`);--> statement-breakpoint
CREATE INDEX `quotes_shop_status_idx` ON `quotes` (`shop_id`,`status`);--> statement-breakpoint
CREATE INDEX `tax_rates_shop_idx` ON `tax_rates` (`shop_id`);