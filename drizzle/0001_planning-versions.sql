CREATE TABLE `planning_versions` (
	`shop_id` varchar(36) NOT NULL,
	`version` bigint NOT NULL,
	CONSTRAINT `planning_versions_shop_id` PRIMARY KEY(`shop_id`)
);
