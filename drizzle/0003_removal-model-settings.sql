ALTER TABLE `shop_settings` ADD `boring_margin_um` decimal(10,1) DEFAULT 10 NOT NULL;--> statement-breakpoint
ALTER TABLE `shop_settings` ADD `boring_rz_um` decimal(10,1) DEFAULT 6 NOT NULL;--> statement-breakpoint
ALTER TABLE `shop_settings` ADD `as_received_cleanup_um` decimal(10,1) DEFAULT 10 NOT NULL;--> statement-breakpoint
ALTER TABLE `shop_settings` ADD `bore_above_stock_um` decimal(10,1) DEFAULT 100 NOT NULL;--> statement-breakpoint
ALTER TABLE `rate_rows` ADD `reference_angle_deg` decimal(5,2) DEFAULT 45 NOT NULL;--> statement-breakpoint
ALTER TABLE `rate_rows` ADD `reference_diameter_um` decimal(10,1);