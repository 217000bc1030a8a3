import { integer, timestamp } from 'drizzle-orm/pg-core';

// By-default identity: bulk imports COPY rows with ids reserved from the sequence up front.
export const id = () => integer().primaryKey().generatedByDefaultAsIdentity();
export const createdAt = () => timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow();
