CREATE TABLE `condensates` (
	`species` text PRIMARY KEY NOT NULL,
	`a` real NOT NULL,
	`b` real NOT NULL,
	`c` real NOT NULL,
	`d` real DEFAULT 0 NOT NULL,
	`valid_pressure_min_bar` real NOT NULL,
	`valid_pressure_max_bar` real NOT NULL,
	`valid_metallicity_min_dex` real NOT NULL,
	`valid_metallicity_max_dex` real NOT NULL,
	`source_key` text NOT NULL,
	`provenance` text NOT NULL,
	`note` text DEFAULT '' NOT NULL,
	FOREIGN KEY (`source_key`) REFERENCES `sources`(`key`) ON UPDATE no action ON DELETE restrict,
	CONSTRAINT "condensates_species_nonempty" CHECK(length("condensates"."species") > 0),
	CONSTRAINT "condensates_pressure_range" CHECK("condensates"."valid_pressure_min_bar" > 0 AND "condensates"."valid_pressure_min_bar" < "condensates"."valid_pressure_max_bar"),
	CONSTRAINT "condensates_metallicity_range" CHECK("condensates"."valid_metallicity_min_dex" < "condensates"."valid_metallicity_max_dex"),
	CONSTRAINT "condensates_provenance" CHECK("condensates"."provenance" IN ('checked', 'secondary', 'computed', 'memory'))
);
--> statement-breakpoint
CREATE TABLE `spectra` (
	`entry_id` text NOT NULL,
	`wavelength_nm` real NOT NULL,
	`value` real NOT NULL,
	PRIMARY KEY(`entry_id`, `wavelength_nm`),
	FOREIGN KEY (`entry_id`) REFERENCES `entries`(`id`) ON UPDATE no action ON DELETE cascade,
	CONSTRAINT "spectra_wavelength_positive" CHECK("spectra"."wavelength_nm" > 0),
	CONSTRAINT "spectra_value_nonnegative" CHECK("spectra"."value" >= 0)
);
