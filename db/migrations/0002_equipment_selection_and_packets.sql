CREATE TABLE `packets` (
	`id` bigint unsigned AUTO_INCREMENT NOT NULL,
	`account_id` bigint unsigned NOT NULL,
	`community_id` bigint unsigned,
	`kind` enum('permit-packet','equipment-schedule','permit-schedule') NOT NULL,
	`file_name` varchar(255) NOT NULL,
	`file_key` varchar(300) NOT NULL,
	`content_type` varchar(120) NOT NULL,
	`size_bytes` int NOT NULL,
	`lot_count` int NOT NULL DEFAULT 0,
	`sent_to` json,
	`created_by_user_id` bigint unsigned NOT NULL,
	`created_at` datetime(3) NOT NULL,
	CONSTRAINT `packets_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `lots` ADD `selection` json;--> statement-breakpoint
ALTER TABLE `packets` ADD CONSTRAINT `packets_account_id_accounts_id_fk` FOREIGN KEY (`account_id`) REFERENCES `accounts`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `packets` ADD CONSTRAINT `packets_community_id_communities_id_fk` FOREIGN KEY (`community_id`) REFERENCES `communities`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `packets` ADD CONSTRAINT `packets_created_by_user_id_users_id_fk` FOREIGN KEY (`created_by_user_id`) REFERENCES `users`(`id`) ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `packets_account_time` ON `packets` (`account_id`,`created_at`);