CREATE TABLE `dataset_chunks` (
	`version_id` int NOT NULL,
	`column_index` smallint NOT NULL,
	`chunk_index` int NOT NULL,
	`encoding` enum('f64','json') NOT NULL,
	`payload` longblob NOT NULL,
	CONSTRAINT `dataset_chunks_version_id_column_index_chunk_index_pk` PRIMARY KEY(`version_id`,`column_index`,`chunk_index`)
);
--> statement-breakpoint
CREATE TABLE `dataset_versions` (
	`id` int AUTO_INCREMENT NOT NULL,
	`dataset_id` int NOT NULL,
	`version` int NOT NULL,
	`sha256` char(64) NOT NULL,
	`row_count` int NOT NULL,
	`column_count` smallint NOT NULL,
	`chunk_rows` int NOT NULL,
	`columns` json NOT NULL,
	`source` json NOT NULL,
	`created_by` int,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `dataset_versions_id` PRIMARY KEY(`id`),
	CONSTRAINT `dataset_versions_dataset_version_unique` UNIQUE(`dataset_id`,`version`)
);
--> statement-breakpoint
CREATE TABLE `datasets` (
	`id` int AUTO_INCREMENT NOT NULL,
	`lab_id` int NOT NULL,
	`name` varchar(120) NOT NULL,
	`latest_version` int NOT NULL DEFAULT 0,
	`created_by` int,
	`created_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	`updated_at` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
	CONSTRAINT `datasets_id` PRIMARY KEY(`id`),
	CONSTRAINT `datasets_lab_name_unique` UNIQUE(`lab_id`,`name`)
);
--> statement-breakpoint
ALTER TABLE `dataset_chunks` ADD CONSTRAINT `dataset_chunks_version_id_dataset_versions_id_fk` FOREIGN KEY (`version_id`) REFERENCES `dataset_versions`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `dataset_versions` ADD CONSTRAINT `dataset_versions_dataset_id_datasets_id_fk` FOREIGN KEY (`dataset_id`) REFERENCES `datasets`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `dataset_versions` ADD CONSTRAINT `dataset_versions_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `datasets` ADD CONSTRAINT `datasets_lab_id_labs_id_fk` FOREIGN KEY (`lab_id`) REFERENCES `labs`(`id`) ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE `datasets` ADD CONSTRAINT `datasets_created_by_users_id_fk` FOREIGN KEY (`created_by`) REFERENCES `users`(`id`) ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX `dataset_versions_sha_idx` ON `dataset_versions` (`sha256`);