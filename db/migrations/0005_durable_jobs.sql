ALTER TABLE `packets` MODIFY COLUMN `file_name` varchar(255) NOT NULL DEFAULT '';--> statement-breakpoint
ALTER TABLE `packets` MODIFY COLUMN `file_key` varchar(300);--> statement-breakpoint
ALTER TABLE `packets` MODIFY COLUMN `content_type` varchar(120) NOT NULL DEFAULT '';--> statement-breakpoint
ALTER TABLE `packets` MODIFY COLUMN `size_bytes` int NOT NULL DEFAULT 0;--> statement-breakpoint
ALTER TABLE `imports` ADD `error_count` int DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE `packets` ADD `state` enum('queued','rendering','sending','ready','failed') DEFAULT 'ready' NOT NULL;--> statement-breakpoint
ALTER TABLE `packets` ADD `request` json;--> statement-breakpoint
ALTER TABLE `packets` ADD `sent_at` datetime(3);--> statement-breakpoint
ALTER TABLE `packets` ADD `error` text;--> statement-breakpoint
ALTER TABLE `packets` ADD `finished_at` datetime(3);