-- Custom migration: every write to a table the plan preview reads (src/server/plans/records.ts) raises
-- its shop's counter in planning_versions, inside the writing transaction, so cached planning records
-- (src/server/plans/records-cache.ts) are dropped by any write path, present or future. An update
-- raises both the old and the new shop. Foreign-key cascades fire no triggers: every cascade into
-- these tables starts from one of them in the same shop (jobs, reading_sets, stones) or from shops.
INSERT IGNORE INTO `planning_versions` (`shop_id`, `version`) SELECT `id`, 1 FROM `shops`;
--> statement-breakpoint
CREATE TRIGGER `jobs_planning_insert` AFTER INSERT ON `jobs` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `jobs_planning_update` AFTER UPDATE ON `jobs` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1), (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `jobs_planning_delete` AFTER DELETE ON `jobs` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `cylinders_planning_insert` AFTER INSERT ON `cylinders` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `cylinders_planning_update` AFTER UPDATE ON `cylinders` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1), (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `cylinders_planning_delete` AFTER DELETE ON `cylinders` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `reading_sets_planning_insert` AFTER INSERT ON `reading_sets` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `reading_sets_planning_update` AFTER UPDATE ON `reading_sets` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1), (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `reading_sets_planning_delete` AFTER DELETE ON `reading_sets` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `readings_planning_insert` AFTER INSERT ON `readings` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `readings_planning_update` AFTER UPDATE ON `readings` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1), (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `readings_planning_delete` AFTER DELETE ON `readings` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `pistons_planning_insert` AFTER INSERT ON `pistons` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `pistons_planning_update` AFTER UPDATE ON `pistons` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1), (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `pistons_planning_delete` AFTER DELETE ON `pistons` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `shop_settings_planning_insert` AFTER INSERT ON `shop_settings` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `shop_settings_planning_update` AFTER UPDATE ON `shop_settings` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1), (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `shop_settings_planning_delete` AFTER DELETE ON `shop_settings` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `machines_planning_insert` AFTER INSERT ON `machines` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `machines_planning_update` AFTER UPDATE ON `machines` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1), (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `machines_planning_delete` AFTER DELETE ON `machines` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `stones_planning_insert` AFTER INSERT ON `stones` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `stones_planning_update` AFTER UPDATE ON `stones` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1), (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `stones_planning_delete` AFTER DELETE ON `stones` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `rate_rows_planning_insert` AFTER INSERT ON `rate_rows` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `rate_rows_planning_update` AFTER UPDATE ON `rate_rows` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1), (NEW.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
--> statement-breakpoint
CREATE TRIGGER `rate_rows_planning_delete` AFTER DELETE ON `rate_rows` FOR EACH ROW
  INSERT INTO `planning_versions` (`shop_id`, `version`) VALUES (OLD.`shop_id`, 1) ON DUPLICATE KEY UPDATE `version` = `version` + 1;
