CREATE TABLE `final_inspections` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`plan_id` varchar(36) NOT NULL,
	`job_id` varchar(36) NOT NULL,
	`cylinder_id` varchar(36) NOT NULL,
	`cylinder_number` int NOT NULL,
	`readings_raw` json NOT NULL,
	`readings` json NOT NULL,
	`block_temperature_c` decimal(4,1),
	`gauge_temperature_c` decimal(4,1),
	`surface` json,
	`status` enum('pass','fail','held') NOT NULL,
	`verdict` json NOT NULL,
	`inspected_by` varchar(36) NOT NULL,
	`inspected_at` datetime(3) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `final_inspections_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `runs` (
	`id` varchar(36) NOT NULL,
	`shop_id` varchar(36) NOT NULL,
	`plan_id` varchar(36) NOT NULL,
	`plan_stage_id` varchar(36) NOT NULL,
	`job_id` varchar(36) NOT NULL,
	`cylinder_id` varchar(36) NOT NULL,
	`cylinder_number` int NOT NULL,
	`stage_position` int NOT NULL,
	`block` enum('full','dwell') NOT NULL,
	`outcome` enum('checkpoint','done','stopped') NOT NULL,
	`stone_id` varchar(36),
	`machine_id` varchar(36) NOT NULL,
	`pressure` decimal(8,2),
	`spindle_rpm` decimal(7,1),
	`double_strokes_per_min` decimal(6,1),
	`strokes_done` int NOT NULL,
	`readings_raw` json,
	`readings_after` json,
	`readings_before` json,
	`block_temperature_c` decimal(4,1),
	`gauge_temperature_c` decimal(4,1),
	`reestimate` json,
	`stone_wear_um` decimal(10,1) NOT NULL,
	`notes` varchar(1000) NOT NULL DEFAULT '',
	`logged_by` varchar(36) NOT NULL,
	`done_at` datetime(3) NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `runs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `final_inspections` ADD CONSTRAINT `final_inspections_plan_id_plans_id_fk` FOREIGN KEY (`plan_id`) REFERENCES `plans`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `runs` ADD CONSTRAINT `runs_plan_id_plans_id_fk` FOREIGN KEY (`plan_id`) REFERENCES `plans`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `final_inspections_shop_plan_cyl_idx` ON `final_inspections` (`shop_id`,`plan_id`,`cylinder_number`,`created_at`);--> statement-breakpoint
CREATE INDEX `runs_shop_plan_cyl_idx` ON `runs` (`shop_id`,`plan_id`,`cylinder_number`,`stage_position`);--> statement-breakpoint
CREATE INDEX `runs_shop_stone_idx` ON `runs` (`shop_id`,`stone_id`);