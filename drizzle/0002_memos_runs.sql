CREATE TABLE `memos` (
	`id` int AUTO_INCREMENT NOT NULL,
	`lab_id` int NOT NULL,
	`title` varchar(200) NOT NULL,
	`doc` longtext NOT NULL,
	`text` longtext NOT NULL,
	`ydoc` longblob,
	`revision` int NOT NULL DEFAULT 1,
	`created_by` int,
	`updated_by` int,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`archived_at` datetime(3),
	CONSTRAINT `memos_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
CREATE TABLE `run_results` (
	`id` int AUTO_INCREMENT NOT NULL,
	`lab_id` int NOT NULL,
	`run_key` char(64) NOT NULL,
	`kind` varchar(40) NOT NULL,
	`engine_version` varchar(80) NOT NULL,
	`result` longtext NOT NULL,
	`compute_ms` int NOT NULL,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `run_results_id` PRIMARY KEY(`id`),
	CONSTRAINT `run_results_lab_key_unique` UNIQUE(`lab_id`,`run_key`)
);
--> statement-breakpoint
CREATE TABLE `runs` (
	`id` int AUTO_INCREMENT NOT NULL,
	`lab_id` int NOT NULL,
	`memo_id` int NOT NULL,
	`block_id` varchar(64) NOT NULL,
	`kind` varchar(40) NOT NULL,
	`run_key` char(64) NOT NULL,
	`dataset_version_id` int,
	`settings` longtext NOT NULL,
	`engine_version` varchar(80) NOT NULL,
	`state` enum('queued','running','current','stale','failed') NOT NULL,
	`progress` double NOT NULL DEFAULT 0,
	`error` longtext,
	`result_id` int,
	`requested_by` int,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`started_at` datetime(3),
	`finished_at` datetime(3),
	CONSTRAINT `runs_id` PRIMARY KEY(`id`)
);
--> statement-breakpoint
ALTER TABLE `memos` ADD CONSTRAINT `memos_lab_id_labs_id_fk` FOREIGN KEY (`lab_id`) REFERENCES `labs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `memos` ADD CONSTRAINT `memos_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `memos` ADD CONSTRAINT `memos_updated_by_users_id_fk` FOREIGN KEY (`updated_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `run_results` ADD CONSTRAINT `run_results_lab_id_labs_id_fk` FOREIGN KEY (`lab_id`) REFERENCES `labs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `runs` ADD CONSTRAINT `runs_lab_id_labs_id_fk` FOREIGN KEY (`lab_id`) REFERENCES `labs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `runs` ADD CONSTRAINT `runs_memo_id_memos_id_fk` FOREIGN KEY (`memo_id`) REFERENCES `memos`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `runs` ADD CONSTRAINT `runs_result_id_run_results_id_fk` FOREIGN KEY (`result_id`) REFERENCES `run_results`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `runs` ADD CONSTRAINT `runs_requested_by_users_id_fk` FOREIGN KEY (`requested_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `memos_lab_updated_idx` ON `memos` (`lab_id`,`updated_at`);--> statement-breakpoint
CREATE INDEX `runs_memo_block_idx` ON `runs` (`memo_id`,`block_id`,`id`);--> statement-breakpoint
CREATE INDEX `runs_lab_key_idx` ON `runs` (`lab_id`,`run_key`);