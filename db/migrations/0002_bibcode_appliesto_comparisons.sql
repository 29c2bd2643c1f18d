CREATE TABLE `comparison_sources` (
	`comparison_id` text NOT NULL,
	`source_key` text NOT NULL,
	`position` integer DEFAULT 0 NOT NULL,
	PRIMARY KEY(`comparison_id`, `source_key`),
	FOREIGN KEY (`comparison_id`) REFERENCES `comparisons`(`id`) ON UPDATE no action ON DELETE cascade,
	FOREIGN KEY (`source_key`) REFERENCES `sources`(`key`) ON UPDATE no action ON DELETE restrict,
	CONSTRAINT "comparison_sources_position" CHECK("comparison_sources"."position" >= 0)
);
--> statement-breakpoint
CREATE INDEX `comparison_sources_source_idx` ON `comparison_sources` (`source_key`);--> statement-breakpoint
CREATE TABLE `comparisons` (
	`id` text PRIMARY KEY NOT NULL,
	`name` text NOT NULL,
	`kind` text NOT NULL,
	`band_id` text,
	`band_min_nm` real NOT NULL,
	`band_max_nm` real NOT NULL,
	`geometric_albedo_min` real NOT NULL,
	`geometric_albedo_nominal` real NOT NULL,
	`geometric_albedo_max` real NOT NULL,
	`equilibrium_temperature_k` real,
	`equilibrium_temperature_min_k` real,
	`equilibrium_temperature_max_k` real,
	`provenance` text NOT NULL,
	`description` text DEFAULT '' NOT NULL,
	CONSTRAINT "comparisons_id_slug" CHECK("comparisons"."id" GLOB '[a-z0-9]*' AND "comparisons"."id" NOT GLOB '*[^a-z0-9-]*'),
	CONSTRAINT "comparisons_name_nonempty" CHECK(length("comparisons"."name") > 0),
	CONSTRAINT "comparisons_kind" CHECK("comparisons"."kind" IN ('planet', 'population')),
	CONSTRAINT "comparisons_provenance" CHECK("comparisons"."provenance" IN ('checked', 'secondary', 'computed', 'memory')),
	CONSTRAINT "comparisons_band_order" CHECK("comparisons"."band_min_nm" > 0 AND "comparisons"."band_min_nm" < "comparisons"."band_max_nm"),
	CONSTRAINT "comparisons_albedo_order" CHECK("comparisons"."geometric_albedo_min" >= 0 AND "comparisons"."geometric_albedo_min" <= "comparisons"."geometric_albedo_nominal" AND "comparisons"."geometric_albedo_nominal" <= "comparisons"."geometric_albedo_max"),
	CONSTRAINT "comparisons_temperature_positive" CHECK("comparisons"."equilibrium_temperature_k" IS NULL OR "comparisons"."equilibrium_temperature_k" > 0),
	CONSTRAINT "comparisons_planet_temperature" CHECK("comparisons"."kind" = 'population' OR "comparisons"."equilibrium_temperature_k" IS NOT NULL),
	CONSTRAINT "comparisons_temperature_range" CHECK(("comparisons"."equilibrium_temperature_min_k" IS NULL OR "comparisons"."equilibrium_temperature_min_k" <= "comparisons"."equilibrium_temperature_k") AND ("comparisons"."equilibrium_temperature_max_k" IS NULL OR "comparisons"."equilibrium_temperature_k" <= "comparisons"."equilibrium_temperature_max_k"))
);
--> statement-breakpoint
ALTER TABLE `entries` ADD `applies_to` text DEFAULT 'any' NOT NULL;--> statement-breakpoint
ALTER TABLE `sources` ADD `bibcode` text;