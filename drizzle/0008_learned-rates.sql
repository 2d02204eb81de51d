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
ALTER TABLE `runs` ADD `learning` json;--> statement-breakpoint
ALTER TABLE `learned_rates` ADD CONSTRAINT `learned_rates_shop_id_shops_id_fk` FOREIGN KEY (`shop_id`) REFERENCES `shops`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `learned_rates` ADD CONSTRAINT `learned_rates_stone_id_stones_id_fk` FOREIGN KEY (`stone_id`) REFERENCES `stones`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `learned_rates` ADD CONSTRAINT `learned_rates_machine_id_machines_id_fk` FOREIGN KEY (`machine_id`) REFERENCES `machines`(`id`) ON DELETE cascade ON UPDATE no action;