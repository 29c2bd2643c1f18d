PRAGMA foreign_keys=OFF;--> statement-breakpoint
CREATE TABLE `__new_entries` (
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
	`applies_to` text DEFAULT 'any' NOT NULL,
	`origin` text NOT NULL,
	`created_at` text NOT NULL,
	`updated_at` text NOT NULL,
	CONSTRAINT "entries_applies_to" CHECK("__new_entries"."applies_to" IN ('any', 'giant', 'sub-neptune', 'giant,sub-neptune', 'rocky', 'giant,rocky', 'sub-neptune,rocky', 'giant,sub-neptune,rocky')),
	CONSTRAINT "entries_id_slug" CHECK("__new_entries"."id" GLOB '[a-z0-9]*' AND "__new_entries"."id" NOT GLOB '*[^a-z0-9-]*'),
	CONSTRAINT "entries_name_nonempty" CHECK(length("__new_entries"."name") > 0),
	CONSTRAINT "entries_category" CHECK("__new_entries"."category" IN ('cloud', 'haze', 'ice', 'ocean', 'rock', 'lava', 'regolith', 'vegetation', 'soil', 'metal', 'body', 'clear-atmosphere', 'model')),
	CONSTRAINT "entries_quantity" CHECK("__new_entries"."quantity" IN ('geometric', 'bond', 'spherical', 'surface', 'single-scattering')),
	CONSTRAINT "entries_provenance" CHECK("__new_entries"."provenance" IN ('checked', 'secondary', 'computed', 'memory', 'user')),
	CONSTRAINT "entries_origin" CHECK("__new_entries"."origin" IN ('curated', 'user')),
	CONSTRAINT "entries_band_order" CHECK("__new_entries"."band_min_nm" > 0 AND "__new_entries"."band_min_nm" < "__new_entries"."band_max_nm"),
	CONSTRAINT "entries_value_order" CHECK("__new_entries"."value_min" >= 0 AND "__new_entries"."value_min" <= "__new_entries"."value_nominal" AND "__new_entries"."value_nominal" <= "__new_entries"."value_max"),
	CONSTRAINT "entries_value_unit_interval" CHECK("__new_entries"."quantity" = 'geometric' OR "__new_entries"."value_max" <= 1),
	CONSTRAINT "entries_temperature_min" CHECK("__new_entries"."temperature_min_k" IS NULL OR "__new_entries"."temperature_min_k" >= 0),
	CONSTRAINT "entries_temperature_max" CHECK("__new_entries"."temperature_max_k" IS NULL OR "__new_entries"."temperature_max_k" > 0),
	CONSTRAINT "entries_temperature_order" CHECK("__new_entries"."temperature_min_k" IS NULL OR "__new_entries"."temperature_max_k" IS NULL OR "__new_entries"."temperature_min_k" <= "__new_entries"."temperature_max_k")
);
--> statement-breakpoint
INSERT INTO `__new_entries`("id", "name", "category", "description", "quantity", "band_min_nm", "band_max_nm", "value_min", "value_max", "value_nominal", "temperature_min_k", "temperature_max_k", "condensate", "provenance", "applies_to", "origin", "created_at", "updated_at") SELECT "id", "name", "category", "description", "quantity", "band_min_nm", "band_max_nm", "value_min", "value_max", "value_nominal", "temperature_min_k", "temperature_max_k", "condensate", "provenance", "applies_to", "origin", "created_at", "updated_at" FROM `entries`;--> statement-breakpoint
DROP TABLE `entries`;--> statement-breakpoint
ALTER TABLE `__new_entries` RENAME TO `entries`;--> statement-breakpoint
PRAGMA foreign_keys=ON;--> statement-breakpoint
CREATE INDEX `entries_category_idx` ON `entries` (`category`);--> statement-breakpoint
CREATE TABLE `__new_sources` (
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
	`bibcode` text,
	`url` text,
	`note` text,
	`origin` text NOT NULL,
	`created_at` text NOT NULL,
	`updated_at` text NOT NULL,
	CONSTRAINT "sources_key_nonempty" CHECK(length("__new_sources"."key") > 0),
	CONSTRAINT "sources_bibcode_length" CHECK("__new_sources"."bibcode" IS NULL OR length("__new_sources"."bibcode") = 19),
	CONSTRAINT "sources_entry_type" CHECK("__new_sources"."entry_type" IN ('article', 'book', 'inproceedings', 'techreport', 'misc')),
	CONSTRAINT "sources_authors_nonempty" CHECK(length("__new_sources"."authors") > 0),
	CONSTRAINT "sources_title_nonempty" CHECK(length("__new_sources"."title") > 0),
	CONSTRAINT "sources_year_range" CHECK("__new_sources"."year" IS NULL OR ("__new_sources"."year" >= 1600 AND "__new_sources"."year" <= 2200)),
	CONSTRAINT "sources_origin" CHECK("__new_sources"."origin" IN ('curated', 'user'))
);
--> statement-breakpoint
INSERT INTO `__new_sources`("key", "entry_type", "authors", "year", "title", "journal", "publisher", "volume", "pages", "doi", "arxiv", "bibcode", "url", "note", "origin", "created_at", "updated_at") SELECT "key", "entry_type", "authors", "year", "title", "journal", "publisher", "volume", "pages", "doi", "arxiv", "bibcode", "url", "note", "origin", "created_at", "updated_at" FROM `sources`;--> statement-breakpoint
DROP TABLE `sources`;--> statement-breakpoint
ALTER TABLE `__new_sources` RENAME TO `sources`;