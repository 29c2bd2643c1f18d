CREATE TABLE `catalog_meta` (
	`key` text PRIMARY KEY NOT NULL,
	`value` text NOT NULL
);
--> statement-breakpoint
CREATE TABLE `entries` (
	`id` text PRIMARY KEY NOT NULL,
	`name` text NOT NULL,
	`category` text NOT NULL,
	`description` text DEFAULT '' NOT NULL,
	`quantity` text NOT NULL,
	`band_min_nm` real NOT NULL,
	`band_max_nm` real NOT NULL,
	`value_min` real NOT NULL,
	`value_max` real NOT NULL,
	`value_nominal` real NOT NULL,
	`temperature_min_k` real,
	`temperature_max_k` real,
	`condensate` text,
	`provenance` text NOT NULL,
	`origin` text NOT NULL,
	`created_at` text NOT NULL,
	`updated_at` text NOT NULL,
	CONSTRAINT "entries_id_slug" CHECK("entries"."id" GLOB '[a-z0-9]*' AND "entries"."id" NOT GLOB '*[^a-z0-9-]*'),
	CONSTRAINT "entries_name_nonempty" CHECK(length("entries"."name") > 0),
	CONSTRAINT "entries_category" CHECK("entries"."category" IN ('cloud', 'haze', 'ice', 'ocean', 'rock', 'lava', 'regolith', 'vegetation', 'soil', 'metal', 'body', 'clear-atmosphere', 'model')),
	CONSTRAINT "entries_quantity" CHECK("entries"."quantity" IN ('geometric', 'bond', 'spherical', 'surface', 'single-scattering')),
	CONSTRAINT "entries_provenance" CHECK("entries"."provenance" IN ('checked', 'secondary', 'computed', 'memory')),
	CONSTRAINT "entries_origin" CHECK("entries"."origin" IN ('curated', 'user')),
	CONSTRAINT "entries_band_order" CHECK("entries"."band_min_nm" > 0 AND "entries"."band_min_nm" < "entries"."band_max_nm"),
	CONSTRAINT "entries_value_order" CHECK("entries"."value_min" >= 0 AND "entries"."value_min" <= "entries"."value_nominal" AND "entries"."value_nominal" <= "entries"."value_max"),
	CONSTRAINT "entries_value_unit_interval" CHECK("entries"."quantity" = 'geometric' OR "entries"."value_max" <= 1),
	CONSTRAINT "entries_temperature_min" CHECK("entries"."temperature_min_k" IS NULL OR "entries"."temperature_min_k" >= 0),
	CONSTRAINT "entries_temperature_max" CHECK("entries"."temperature_max_k" IS NULL OR "entries"."temperature_max_k" > 0),
	CONSTRAINT "entries_temperature_order" CHECK("entries"."temperature_min_k" IS NULL OR "entries"."temperature_max_k" IS NULL OR "entries"."temperature_min_k" <= "entries"."temperature_max_k")
);
--> statement-breakpoint
CREATE INDEX `entries_category_idx` ON `entries` (`category`);--> statement-breakpoint
CREATE TABLE `entry_sources` (
	`entry_id` text NOT NULL,
	`source_key` text NOT NULL,
	`position` integer DEFAULT 0 NOT NULL,
	PRIMARY KEY(`entry_id`, `source_key`),
	FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`source_key`) REFERENCES `sources`(`key`) ON UPDATE no action ON DELETE restrict,
	CONSTRAINT "entry_sources_position" CHECK("entry_sources"."position" >= 0)
);
--> statement-breakpoint
CREATE INDEX `entry_sources_source_idx` ON `entry_sources` (`source_key`);--> statement-breakpoint
CREATE TABLE `sources` (
	`key` text PRIMARY KEY NOT NULL,
	`entry_type` text DEFAULT 'article' NOT NULL,
	`authors` text NOT NULL,
	`year` integer,
	`title` text NOT NULL,
	`journal` text,
	`publisher` text,
	`volume` text,
	`pages` text,
	`doi` text,
	`arxiv` text,
	`url` text,
	`note` text,
	`origin` text NOT NULL,
	`created_at` text NOT NULL,
	`updated_at` text NOT NULL,
	CONSTRAINT "sources_key_nonempty" CHECK(length("sources"."key") > 0),
	CONSTRAINT "sources_entry_type" CHECK("sources"."entry_type" IN ('article', 'book', 'inproceedings', 'techreport', 'misc')),
	CONSTRAINT "sources_authors_nonempty" CHECK(length("sources"."authors") > 0),
	CONSTRAINT "sources_title_nonempty" CHECK(length("sources"."title") > 0),
	CONSTRAINT "sources_year_range" CHECK("sources"."year" IS NULL OR ("sources"."year" >= 1600 AND "sources"."year" <= 2200)),
	CONSTRAINT "sources_origin" CHECK("sources"."origin" IN ('curated', 'user'))
);
