ALTER TABLE `shop_settings` ADD `max_temperature_difference_k` decimal(4,1) DEFAULT 2 NOT NULL;--> statement-breakpoint
ALTER TABLE `shop_settings` ADD `gauge_temperature_c` decimal(4,1);--> statement-breakpoint
ALTER TABLE `final_inspections` ADD `surface_report_id` varchar(36);