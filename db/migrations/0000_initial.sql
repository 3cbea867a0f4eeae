CREATE TABLE `accounts` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`name` varchar(160) NOT NULL,
	`slug` varchar(80) NOT NULL,
	`sizing_limits` json,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `accounts_id` PRIMARY KEY(`id`),
	CONSTRAINT `accounts_slug_unique` UNIQUE(`slug`)
);
--> statement-breakpoint
CREATE TABLE `audit_log` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`account_id` bigint unsigned NOT NULL,
	`user_id` bigint unsigned,
	`action` varchar(60) NOT NULL,
	`entity_type` varchar(40) NOT NULL,
	`entity_id` bigint unsigned,
	`summary` text NOT NULL,
	`before` json,
	`after` json,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `audit_log_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `communities` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`account_id` bigint unsigned NOT NULL,
	`name` varchar(160) NOT NULL,
	`locality` varchar(160) NOT NULL DEFAULT '',
	`conditions` json NOT NULL,
	`version` int NOT NULL DEFAULT 1,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `communities_id` PRIMARY KEY(`id`),
	CONSTRAINT `communities_account_name` UNIQUE(`account_id`,`name`)
);
--> statement-breakpoint
CREATE TABLE `equipment_systems` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`account_id` bigint unsigned NOT NULL,
	`system_code` varchar(60) NOT NULL,
	`system_type` enum('ac-furnace','heat-pump','heat-pump-backup','furnace') NOT NULL,
	`outdoor_model` varchar(80) NOT NULL DEFAULT '',
	`indoor_model` varchar(80) NOT NULL DEFAULT '',
	`furnace_model` varchar(80) NOT NULL DEFAULT '',
	`nominal_tons` decimal(4,2),
	`cooling_total_btuh` int,
	`cooling_sensible_btuh` int,
	`heating_output_btuh` int,
	`heat_pump_47_btuh` int,
	`heat_pump_17_btuh` int,
	`backup_heat_btuh` int,
	`seer2` decimal(4,1),
	`hspf2` decimal(4,1),
	`afue_pct` decimal(4,1),
	`price_usd` decimal(10,2),
	`version` int NOT NULL DEFAULT 1,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `equipment_systems_id` PRIMARY KEY(`id`),
	CONSTRAINT `equipment_account_code` UNIQUE(`account_id`,`system_code`)
);
--> statement-breakpoint
CREATE TABLE `imports` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`account_id` bigint unsigned NOT NULL,
	`user_id` bigint unsigned NOT NULL,
	`kind` enum('plans','lots','equipment') NOT NULL,
	`community_id` bigint unsigned,
	`file_name` varchar(255) NOT NULL,
	`file_size_bytes` int NOT NULL,
	`file_key` varchar(300),
	`state` enum('received','validating','computing','saving','succeeded','failed') NOT NULL DEFAULT 'received',
	`progress_pct` int NOT NULL DEFAULT 0,
	`created_count` int NOT NULL DEFAULT 0,
	`updated_count` int NOT NULL DEFAULT 0,
	`errors` json,
	`created_at` datetime(3) NOT NULL,
	`finished_at` datetime(3),
	CONSTRAINT `imports_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `invitations` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`account_id` bigint unsigned NOT NULL,
	`email` varchar(254) NOT NULL,
	`name` varchar(160) NOT NULL,
	`role` enum('admin','designer','reviewer','purchasing','viewer') NOT NULL,
	`token_hash` varchar(64) NOT NULL,
	`invited_by_user_id` bigint unsigned NOT NULL,
	`expires_at` datetime NOT NULL,
	`accepted_at` datetime,
	`revoked_at` datetime,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `invitations_id` PRIMARY KEY(`id`),
	CONSTRAINT `invitations_token_hash_unique` UNIQUE(`token_hash`)
);
--> statement-breakpoint
CREATE TABLE `lots` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`account_id` bigint unsigned NOT NULL,
	`community_id` bigint unsigned NOT NULL,
	`lot_number` varchar(40) NOT NULL,
	`address` varchar(200) NOT NULL DEFAULT '',
	`plan_id` bigint unsigned,
	`facing_deg` decimal(5,1) NOT NULL DEFAULT '0',
	`options_note` varchar(300) NOT NULL DEFAULT '',
	`status` enum('planned','permit_submitted','permitted','built') NOT NULL DEFAULT 'planned',
	`planned_start` date,
	`results` json,
	`results_revision_id` bigint unsigned,
	`results_computed_at` datetime(3),
	`permit_snapshot` json,
	`permit_snapshot_at` datetime,
	`equipment_system_id` bigint unsigned,
	`equipment_override` boolean NOT NULL DEFAULT false,
	`version` int NOT NULL DEFAULT 1,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `lots_id` PRIMARY KEY(`id`),
	CONSTRAINT `lots_community_number` UNIQUE(`community_id`,`lot_number`)
);
--> statement-breakpoint
CREATE TABLE `memberships` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`user_id` bigint unsigned NOT NULL,
	`account_id` bigint unsigned NOT NULL,
	`role` enum('admin','designer','reviewer','purchasing','viewer') NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `memberships_id` PRIMARY KEY(`id`),
	CONSTRAINT `memberships_user_account` UNIQUE(`user_id`,`account_id`)
);
--> statement-breakpoint
CREATE TABLE `plan_revisions` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`account_id` bigint unsigned NOT NULL,
	`plan_id` bigint unsigned NOT NULL,
	`number` int NOT NULL,
	`input` json NOT NULL,
	`results` json,
	`engine_version` varchar(20),
	`status` enum('draft','approved') NOT NULL DEFAULT 'draft',
	`approved_by_user_id` bigint unsigned,
	`approver_name` varchar(160),
	`approver_credential` varchar(160),
	`approved_on` date,
	`created_by_user_id` bigint unsigned,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `plan_revisions_id` PRIMARY KEY(`id`),
	CONSTRAINT `plan_revisions_plan_number` UNIQUE(`plan_id`,`number`)
);
--> statement-breakpoint
CREATE TABLE `plans` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`account_id` bigint unsigned NOT NULL,
	`plan_code` varchar(40) NOT NULL,
	`name` varchar(160) NOT NULL,
	`current_revision_id` bigint unsigned,
	`version` int NOT NULL DEFAULT 1,
	`created_at` datetime(3) NOT NULL,
	`updated_at` datetime(3) NOT NULL,
	CONSTRAINT `plans_id` PRIMARY KEY(`id`),
	CONSTRAINT `plans_account_code` UNIQUE(`account_id`,`plan_code`)
);
--> statement-breakpoint
CREATE TABLE `sign_in_attempts` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`email` varchar(254) NOT NULL,
	`client_address` varchar(64) NOT NULL,
	`succeeded` boolean NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `sign_in_attempts_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `users` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`email` varchar(254) NOT NULL,
	`name` varchar(160) NOT NULL,
	`password_hash` varchar(100),
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `users_id` PRIMARY KEY(`id`),
	CONSTRAINT `users_email_unique` UNIQUE(`email`)
);
--> statement-breakpoint
ALTER TABLE `audit_log` ADD CONSTRAINT `audit_log_account_id_accounts_id_fk` FOREIGN KEY (`account_id`) REFERENCES `accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `audit_log` ADD CONSTRAINT `audit_log_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `communities` ADD CONSTRAINT `communities_account_id_accounts_id_fk` FOREIGN KEY (`account_id`) REFERENCES `accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `equipment_systems` ADD CONSTRAINT `equipment_systems_account_id_accounts_id_fk` FOREIGN KEY (`account_id`) REFERENCES `accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `imports` ADD CONSTRAINT `imports_account_id_accounts_id_fk` FOREIGN KEY (`account_id`) REFERENCES `accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `imports` ADD CONSTRAINT `imports_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `imports` ADD CONSTRAINT `imports_community_id_communities_id_fk` FOREIGN KEY (`community_id`) REFERENCES `communities`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_account_id_accounts_id_fk` FOREIGN KEY (`account_id`) REFERENCES `accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `invitations` ADD CONSTRAINT `invitations_invited_by_user_id_users_id_fk` FOREIGN KEY (`invited_by_user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lots` ADD CONSTRAINT `lots_account_id_accounts_id_fk` FOREIGN KEY (`account_id`) REFERENCES `accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lots` ADD CONSTRAINT `lots_community_id_communities_id_fk` FOREIGN KEY (`community_id`) REFERENCES `communities`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lots` ADD CONSTRAINT `lots_plan_id_plans_id_fk` FOREIGN KEY (`plan_id`) REFERENCES `plans`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `lots` ADD CONSTRAINT `lots_equipment_system_id_equipment_systems_id_fk` FOREIGN KEY (`equipment_system_id`) REFERENCES `equipment_systems`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `memberships` ADD CONSTRAINT `memberships_user_id_users_id_fk` FOREIGN KEY (`user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `memberships` ADD CONSTRAINT `memberships_account_id_accounts_id_fk` FOREIGN KEY (`account_id`) REFERENCES `accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `plan_revisions` ADD CONSTRAINT `plan_revisions_account_id_accounts_id_fk` FOREIGN KEY (`account_id`) REFERENCES `accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `plan_revisions` ADD CONSTRAINT `plan_revisions_plan_id_plans_id_fk` FOREIGN KEY (`plan_id`) REFERENCES `plans`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `plan_revisions` ADD CONSTRAINT `plan_revisions_approved_by_user_id_users_id_fk` FOREIGN KEY (`approved_by_user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `plan_revisions` ADD CONSTRAINT `plan_revisions_created_by_user_id_users_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `plans` ADD CONSTRAINT `plans_account_id_accounts_id_fk` FOREIGN KEY (`account_id`) REFERENCES `accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `audit_account_time` ON `audit_log` (`account_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `audit_entity` ON `audit_log` (`entity_type`,`entity_id`);--> statement-breakpoint
CREATE INDEX `imports_account_time` ON `imports` (`account_id`,`created_at`);--> statement-breakpoint
CREATE INDEX `invitations_account` ON `invitations` (`account_id`);--> statement-breakpoint
CREATE INDEX `lots_account` ON `lots` (`account_id`);--> statement-breakpoint
CREATE INDEX `lots_plan` ON `lots` (`plan_id`);--> statement-breakpoint
CREATE INDEX `memberships_account` ON `memberships` (`account_id`);--> statement-breakpoint
CREATE INDEX `plan_revisions_account` ON `plan_revisions` (`account_id`);--> statement-breakpoint
CREATE INDEX `sign_in_attempts_email_time` ON `sign_in_attempts` (`email`,`created_at`);--> statement-breakpoint
CREATE INDEX `sign_in_attempts_addr_time` ON `sign_in_attempts` (`client_address`,`created_at`);