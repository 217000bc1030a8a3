-- Rail search: trigram similarity on normalised net names and aliases, with the board column in the same GIN index.
CREATE EXTENSION IF NOT EXISTS pg_trgm;
--> statement-breakpoint
CREATE EXTENSION IF NOT EXISTS btree_gin;
