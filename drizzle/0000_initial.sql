CREATE TABLE `app_markers` (
	`name` varchar(64) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `app_markers_name` PRIMARY KEY(`name`)
);
--> statement-breakpoint
CREATE TABLE `memberships` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`role` enum('owner','lead','machinist','apprentice') NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `memberships_id` PRIMARY KEY(`id`),
	CONSTRAINT `memberships_shop_user_unique` UNIQUE(`shop_id`,`user_id`)
);
--> statement-breakpoint
CREATE TABLE `shops` (
	`id` varchar(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `shops_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `users` (
	`id` varchar(36) NOT NULL,
	`email` varchar(254) NOT NULL,
	`name` varchar(120) NOT NULL,
	`password_hash` varchar(255) NOT NULL,
	`unit_system` enum('metric','inch') NOT NULL DEFAULT 'metric',
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_unique` UNIQUE(`email`)
);
--> statement-breakpoint
CREATE TABLE `email_outbox` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36),
	`kind` varchar(40) NOT NULL,
	`to_address` varchar(254) NOT NULL,
	`subject` varchar(200) NOT NULL,
	`html` mediumtext NOT NULL,
	`text` mediumtext NOT NULL,
	`status` enum('pending','sent','failed') NOT NULL DEFAULT 'pending',
	`attempts` int NOT NULL DEFAULT 0,
	`next_attempt_at` datetime(3) NOT NULL,
	`locked_until` datetime(3),
	`last_error` varchar(500),
	`sent_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `email_outbox_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `invitations` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`email` varchar(254) NOT NULL,
	`role` enum('owner','lead','machinist','apprentice') NOT NULL,
	`token_hash` char(64) CHARACTER SET ascii COLLATE ascii_bin NOT NULL,
	`invited_by_user_id` varchar(36),
	`expires_at` datetime(3) NOT NULL,
	`accepted_at` datetime(3),
	`revoked_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `invitations_id` PRIMARY KEY(`id`),
	CONSTRAINT `invitations_token_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `password_reset_tokens` (
	`id` varchar(36) NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`token_hash` char(64) CHARACTER SET ascii COLLATE ascii_bin NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`used_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `password_reset_tokens_id` PRIMARY KEY(`id`),
	CONSTRAINT `password_reset_token_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `rate_limit_buckets` (
	`bucket_key` varchar(191) NOT NULL,
	`window_started_at` datetime(3) NOT NULL,
	`hits` int NOT NULL DEFAULT 0,
	`last_hit_at` datetime(3) NOT NULL,
	CONSTRAINT `rate_limit_buckets_bucket_key` PRIMARY KEY(`bucket_key`)
);
--> statement-breakpoint
CREATE TABLE `sessions` (
	`id` char(64) CHARACTER SET ascii COLLATE ascii_bin NOT NULL,
	`user_id` varchar(36) NOT NULL,
	`expires_at` datetime(3) NOT NULL,
	`signed_in_at` datetime(3) NOT NULL,
	`active_shop_id` varchar(36),
	`user_agent` varchar(200) NOT NULL DEFAULT '',
	CONSTRAINT `sessions_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `attachments` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`job_id` varchar(36) NOT NULL,
	`cylinder_id` varchar(36),
	`kind` enum('photo','report','gauge') NOT NULL,
	`display_name` varchar(120) NOT NULL,
	`stored_name` varchar(80) NOT NULL,
	`thumbnail_name` varchar(80),
	`content_type` varchar(60) NOT NULL,
	`size_bytes` int NOT NULL,
	`uploaded_by` varchar(36) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `attachments_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `customers` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`name` varchar(120) NOT NULL,
	`email` varchar(254),
	`phone` varchar(40),
	`notes` varchar(2000),
	`archived_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `customers_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `cylinders` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`job_id` varchar(36) NOT NULL,
	`number` int NOT NULL,
	`assigned_user_id` varchar(36),
	`notes` varchar(1000),
	CONSTRAINT `cylinders_id` PRIMARY KEY(`id`),
	CONSTRAINT `cylinders_job_number_unique` UNIQUE(`job_id`,`number`)
);
--> statement-breakpoint
CREATE TABLE `job_number_sequences` (
	`shop_id` varchar(36) NOT NULL,
	`last_number` int NOT NULL DEFAULT 0,
	CONSTRAINT `job_number_sequences_shop_id` PRIMARY KEY(`shop_id`)
);
--> statement-breakpoint
CREATE TABLE `jobs` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`number` int NOT NULL,
	`customer_id` varchar(36),
	`engine_description` varchar(200) NOT NULL,
	`bore_material` enum('grey_iron','cgi','ductile_iron','al_iron_liner','steel_liner','hypereutectic_al','coated') NOT NULL,
	`cylinder_count` int NOT NULL,
	`standard_bore_um` decimal(10,1) NOT NULL,
	`bore_length_um` decimal(10,1) NOT NULL,
	`bottom_clearance_um` decimal(10,1),
	`wall_thickness_um` decimal(10,1),
	`min_wall_um` decimal(10,1),
	`torque_plate` boolean NOT NULL DEFAULT false,
	`due_date` date,
	`notes` varchar(4000),
	`status` enum('received','measured','planned','in_work','inspected','delivered') NOT NULL DEFAULT 'received',
	`assigned_user_id` varchar(36),
	`created_by` varchar(36) NOT NULL,
	`archived_at` datetime(3),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `jobs_id` PRIMARY KEY(`id`),
	CONSTRAINT `jobs_shop_number_unique` UNIQUE(`shop_id`,`number`)
);
--> statement-breakpoint
CREATE TABLE `pistons` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`job_id` varchar(36) NOT NULL,
	`cylinder_id` varchar(36),
	`label` varchar(40) NOT NULL,
	`diameter_um` decimal(10,1) NOT NULL,
	`sizing_height_um` decimal(10,1) NOT NULL,
	`type` enum('cast','hypereutectic','forged','coated_skirt') NOT NULL,
	`clearance_min_um` decimal(10,1) NOT NULL,
	`clearance_max_um` decimal(10,1) NOT NULL,
	`notes` varchar(1000),
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `pistons_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `reading_sets` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`job_id` varchar(36) NOT NULL,
	`cylinder_id` varchar(36) NOT NULL,
	`kind` enum('as_received','after_boring','checkpoint','final') NOT NULL,
	`gauge` varchar(80),
	`temperature_c` decimal(4,1),
	`source` enum('manual','csv') NOT NULL DEFAULT 'manual',
	`client_key` varchar(64),
	`taken_by` varchar(36) NOT NULL,
	`taken_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `reading_sets_id` PRIMARY KEY(`id`),
	CONSTRAINT `reading_sets_client_key_unique` UNIQUE(`shop_id`,`client_key`)
);
--> statement-breakpoint
CREATE TABLE `readings` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`reading_set_id` varchar(36) NOT NULL,
	`level_index` int NOT NULL,
	`level` varchar(40) NOT NULL,
	`direction` enum('A','B') NOT NULL,
	`diameter_um` decimal(10,1) NOT NULL,
	CONSTRAINT `readings_id` PRIMARY KEY(`id`),
	CONSTRAINT `readings_set_point_unique` UNIQUE(`reading_set_id`,`level_index`,`direction`)
);
--> statement-breakpoint
CREATE TABLE `shop_settings` (
	`shop_id` varchar(36) NOT NULL,
	`taper_tolerance_um` decimal(10,1) NOT NULL,
	`out_of_round_tolerance_um` decimal(10,1) NOT NULL,
	`honing_allowance_um` decimal(10,1) NOT NULL,
	`oversize_steps_um` text NOT NULL,
	`reading_levels` text NOT NULL,
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `shop_settings_shop_id` PRIMARY KEY(`shop_id`)
);
--> statement-breakpoint
CREATE TABLE `machines` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`name` varchar(80) NOT NULL,
	`spindle_rpm_min` int NOT NULL,
	`spindle_rpm_max` int NOT NULL,
	`double_strokes_per_min_min` decimal(6,1) NOT NULL,
	`double_strokes_per_min_max` decimal(6,1) NOT NULL,
	`max_stroke_length_um` decimal(10,1) NOT NULL,
	`drive` enum('constant','crank') NOT NULL,
	`pressure_unit` enum('bar','dial','N') NOT NULL,
	`pressure_min` decimal(8,2) NOT NULL,
	`pressure_max` decimal(8,2) NOT NULL,
	`head_stone_length_um` decimal(10,1) NOT NULL,
	`notes` varchar(500) NOT NULL DEFAULT '',
	`active` boolean NOT NULL DEFAULT true,
	`is_demo` boolean NOT NULL DEFAULT false,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `machines_id` PRIMARY KEY(`id`),
	CONSTRAINT `machines_shop_name_unique` UNIQUE(`shop_id`,`name`)
);
--> statement-breakpoint
CREATE TABLE `rate_row_versions` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`version` int NOT NULL,
	`kind` enum('create','update','retire','reactivate','restore') NOT NULL,
	`restored_from_version` int,
	`old_values` json,
	`new_values` json NOT NULL,
	`reason` text NOT NULL,
	`changed_by` varchar(36),
	`changed_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`rate_row_id` varchar(36) NOT NULL,
	`stone_id` varchar(36) NOT NULL,
	CONSTRAINT `rate_row_versions_id` PRIMARY KEY(`id`),
	CONSTRAINT `rate_row_versions_row_version_unique` UNIQUE(`rate_row_id`,`version`)
);
--> statement-breakpoint
CREATE TABLE `rate_rows` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`stone_id` varchar(36) NOT NULL,
	`bore_material` enum('grey_iron','cgi','ductile_iron','al_iron_liner','steel_liner','hypereutectic_al','coated') NOT NULL,
	`removal_per_double_stroke_um` decimal(9,3) NOT NULL,
	`reference_pressure` decimal(8,2) NOT NULL,
	`reference_pressure_unit` enum('bar','dial','N') NOT NULL,
	`reference_bore_length_um` decimal(10,1) NOT NULL,
	`ra_um` decimal(9,3) NOT NULL,
	`rz_um` decimal(9,3) NOT NULL,
	`rk_um` decimal(9,3),
	`rpk_um` decimal(9,3),
	`rvk_um` decimal(9,3),
	`cleanup_mode` enum('explicit','from_rz') NOT NULL,
	`cleanup_stock_um` decimal(10,1),
	`cleanup_rz_multiple` decimal(4,2),
	`wear_um_per_um_stock` decimal(8,4) NOT NULL,
	`uncertainty_fraction` decimal(4,3) NOT NULL,
	`source` enum('shop_measurement','maker_data_sheet','demo') NOT NULL,
	`notes` varchar(500) NOT NULL DEFAULT '',
	`version` int NOT NULL DEFAULT 1,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `rate_rows_id` PRIMARY KEY(`id`),
	CONSTRAINT `rate_rows_stone_material_unique` UNIQUE(`stone_id`,`bore_material`)
);
--> statement-breakpoint
CREATE TABLE `stone_versions` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`version` int NOT NULL,
	`kind` enum('create','update','retire','reactivate','restore') NOT NULL,
	`restored_from_version` int,
	`old_values` json,
	`new_values` json NOT NULL,
	`reason` text NOT NULL,
	`changed_by` varchar(36),
	`changed_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`stone_id` varchar(36) NOT NULL,
	CONSTRAINT `stone_versions_id` PRIMARY KEY(`id`),
	CONSTRAINT `stone_versions_stone_version_unique` UNIQUE(`stone_id`,`version`)
);
--> statement-breakpoint
CREATE TABLE `stones` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`code` varchar(40) NOT NULL,
	`role` enum('coarse','finish','plateau') NOT NULL,
	`abrasive` enum('aluminium_oxide','silicon_carbide','diamond','cbn','plateau_brush') NOT NULL,
	`grit_scale` enum('FEPA-F','JIS','ANSI','FEPA-P','D','B') NOT NULL,
	`grit_number` int NOT NULL,
	`bond` varchar(60) NOT NULL,
	`stone_length_um` decimal(10,1) NOT NULL,
	`stone_width_um` decimal(10,1) NOT NULL,
	`stones_per_head` int NOT NULL,
	`start_height_um` decimal(10,1) NOT NULL,
	`wear_limit_height_um` decimal(10,1) NOT NULL,
	`current_height_um` decimal(10,1) NOT NULL,
	`notes` varchar(500) NOT NULL DEFAULT '',
	`active` boolean NOT NULL DEFAULT true,
	`is_demo` boolean NOT NULL DEFAULT false,
	`version` int NOT NULL DEFAULT 1,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `stones_id` PRIMARY KEY(`id`),
	CONSTRAINT `stones_shop_code_unique` UNIQUE(`shop_id`,`code`)
);
--> statement-breakpoint
CREATE TABLE `plan_stages` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`plan_id` varchar(36) NOT NULL,
	`cylinder_number` int NOT NULL,
	`position` int NOT NULL,
	`kind` enum('bore','coarse','finish','plateau') NOT NULL,
	`bore_basis` enum('readings','diameter','stock') NOT NULL,
	`stone_id` varchar(36),
	`rate_row_id` varchar(36),
	`rate_row_version` int,
	`stock_um` decimal(10,1) NOT NULL,
	`diameter_before_um` decimal(10,1) NOT NULL,
	`diameter_after_um` decimal(10,1) NOT NULL,
	`strokes_nominal` int,
	`strokes_low` int,
	`strokes_high` int,
	`checkpoint_after_strokes` int,
	`pressure` decimal(8,2),
	`spindle_rpm` decimal(7,1),
	`double_strokes_per_min` decimal(6,1),
	`stroke_length_um` decimal(10,1),
	`detail` json NOT NULL,
	CONSTRAINT `plan_stages_id` PRIMARY KEY(`id`),
	CONSTRAINT `plan_stages_plan_cyl_pos_unique` UNIQUE(`plan_id`,`cylinder_number`,`position`)
);
--> statement-breakpoint
CREATE TABLE `plans` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`job_id` varchar(36) NOT NULL,
	`status` enum('draft','released','done','withdrawn') NOT NULL DEFAULT 'draft',
	`released_job_id` varchar(36) GENERATED ALWAYS AS ((case when `status` = 'released' then `job_id` end)) STORED,
	`machine_id` varchar(36) NOT NULL,
	`bore_material` enum('grey_iron','cgi','ductile_iron','al_iron_liner','steel_liner','hypereutectic_al','coated') NOT NULL,
	`inputs` json NOT NULL,
	`summary` json NOT NULL,
	`rate_versions` json NOT NULL,
	`can_release` boolean NOT NULL DEFAULT false,
	`note` varchar(500) NOT NULL DEFAULT '',
	`withdrawn_reason` varchar(500),
	`created_by` varchar(36) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`released_by` varchar(36),
	`released_at` datetime(3),
	`withdrawn_by` varchar(36),
	`withdrawn_at` datetime(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `plans_id` PRIMARY KEY(`id`),
	CONSTRAINT `plans_one_released_per_job` UNIQUE(`released_job_id`)
);
--> statement-breakpoint
ALTER TABLE `memberships` ADD CONSTRAINT `memberships_shop_id_shops_id_fk` FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `memberships` ADD CONSTRAINT `memberships_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_shop_id_shops_id_fk` FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_invited_by_user_id_users_id_fk` FOREIGN KEY (`invited_by_user_id`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `password_reset_tokens` ADD CONSTRAINT `password_reset_tokens_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sessions` ADD CONSTRAINT `sessions_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `sessions` ADD CONSTRAINT `sessions_active_shop_id_shops_id_fk` FOREIGN KEY (`active_shop_id`) REFERENCES `shops`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `attachments` ADD CONSTRAINT `attachments_job_id_jobs_id_fk` FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `cylinders` ADD CONSTRAINT `cylinders_job_id_jobs_id_fk` FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `pistons` ADD CONSTRAINT `pistons_job_id_jobs_id_fk` FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reading_sets` ADD CONSTRAINT `reading_sets_job_id_jobs_id_fk` FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `reading_sets` ADD CONSTRAINT `reading_sets_cylinder_id_cylinders_id_fk` FOREIGN KEY (`cylinder_id`) REFERENCES `cylinders`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `readings` ADD CONSTRAINT `readings_reading_set_id_reading_sets_id_fk` FOREIGN KEY (`reading_set_id`) REFERENCES `reading_sets`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `machines` ADD CONSTRAINT `machines_shop_id_shops_id_fk` FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `rate_row_versions` ADD CONSTRAINT `rate_row_versions_shop_id_shops_id_fk` FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `rate_row_versions` ADD CONSTRAINT `rate_row_versions_changed_by_users_id_fk` FOREIGN KEY (`changed_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `rate_row_versions` ADD CONSTRAINT `rate_row_versions_rate_row_id_rate_rows_id_fk` FOREIGN KEY (`rate_row_id`) REFERENCES `rate_rows`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `rate_rows` ADD CONSTRAINT `rate_rows_shop_id_shops_id_fk` FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `rate_rows` ADD CONSTRAINT `rate_rows_stone_id_stones_id_fk` FOREIGN KEY (`stone_id`) REFERENCES `stones`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stone_versions` ADD CONSTRAINT `stone_versions_shop_id_shops_id_fk` FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stone_versions` ADD CONSTRAINT `stone_versions_changed_by_users_id_fk` FOREIGN KEY (`changed_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stone_versions` ADD CONSTRAINT `stone_versions_stone_id_stones_id_fk` FOREIGN KEY (`stone_id`) REFERENCES `stones`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `stones` ADD CONSTRAINT `stones_shop_id_shops_id_fk` FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `plan_stages` ADD CONSTRAINT `plan_stages_plan_id_plans_id_fk` FOREIGN KEY (`plan_id`) REFERENCES `plans`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `plans` ADD CONSTRAINT `plans_job_id_jobs_id_fk` FOREIGN KEY (`job_id`) REFERENCES `jobs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `memberships_user_idx` ON `memberships` (`user_id`);--> statement-breakpoint
CREATE INDEX `email_outbox_due_idx` ON `email_outbox` (`status`,`next_attempt_at`);--> statement-breakpoint
CREATE INDEX `email_outbox_shop_idx` ON `email_outbox` (`shop_id`);--> statement-breakpoint
CREATE INDEX `invitations_shop_idx` ON `invitations` (`shop_id`);--> statement-breakpoint
CREATE INDEX `password_reset_user_idx` ON `password_reset_tokens` (`user_id`);--> statement-breakpoint
CREATE INDEX `sessions_user_idx` ON `sessions` (`user_id`);--> statement-breakpoint
CREATE INDEX `attachments_shop_job_idx` ON `attachments` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE INDEX `customers_shop_idx` ON `customers` (`shop_id`,`name`);--> statement-breakpoint
CREATE INDEX `cylinders_shop_idx` ON `cylinders` (`shop_id`);--> statement-breakpoint
CREATE INDEX `jobs_shop_status_idx` ON `jobs` (`shop_id`,`status`);--> statement-breakpoint
CREATE INDEX `jobs_shop_due_idx` ON `jobs` (`shop_id`,`due_date`);--> statement-breakpoint
CREATE INDEX `jobs_customer_idx` ON `jobs` (`customer_id`);--> statement-breakpoint
CREATE INDEX `pistons_shop_job_idx` ON `pistons` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE INDEX `reading_sets_cylinder_idx` ON `reading_sets` (`cylinder_id`,`taken_at`);--> statement-breakpoint
CREATE INDEX `reading_sets_shop_job_idx` ON `reading_sets` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE INDEX `readings_shop_idx` ON `readings` (`shop_id`);--> statement-breakpoint
CREATE INDEX `machines_shop_idx` ON `machines` (`shop_id`);--> statement-breakpoint
CREATE INDEX `rate_row_versions_shop_idx` ON `rate_row_versions` (`shop_id`);--> statement-breakpoint
CREATE INDEX `rate_row_versions_stone_idx` ON `rate_row_versions` (`stone_id`);--> statement-breakpoint
CREATE INDEX `rate_rows_shop_idx` ON `rate_rows` (`shop_id`);--> statement-breakpoint
CREATE INDEX `stone_versions_shop_idx` ON `stone_versions` (`shop_id`);--> statement-breakpoint
CREATE INDEX `stones_shop_idx` ON `stones` (`shop_id`);--> statement-breakpoint
CREATE INDEX `plan_stages_shop_idx` ON `plan_stages` (`shop_id`);--> statement-breakpoint
CREATE INDEX `plan_stages_stone_idx` ON `plan_stages` (`shop_id`,`stone_id`);--> statement-breakpoint
CREATE INDEX `plans_shop_job_idx` ON `plans` (`shop_id`,`job_id`);--> statement-breakpoint
CREATE INDEX `plans_shop_status_idx` ON `plans` (`shop_id`,`status`);