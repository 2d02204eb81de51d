DROP INDEX `runs_shop_stone_idx` ON `runs`;--> statement-breakpoint
CREATE INDEX `runs_shop_done_idx` ON `runs` (`shop_id`,`done_at`);--> statement-breakpoint
CREATE INDEX `runs_shop_machine_done_idx` ON `runs` (`shop_id`,`machine_id`,`done_at`);--> statement-breakpoint
CREATE INDEX `runs_shop_person_done_idx` ON `runs` (`shop_id`,`logged_by`,`done_at`);--> statement-breakpoint
CREATE INDEX `runs_shop_stone_idx` ON `runs` (`shop_id`,`stone_id`,`done_at`);