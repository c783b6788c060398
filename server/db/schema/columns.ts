import { timestamp } from 'drizzle-orm/pg-core';

/** A moment, with its time zone. */
export const at = (name: string) => timestamp(name, { withTimezone: true });
export const createdAt = () => at('created_at').notNull().defaultNow();
export const updatedAt = () => at('updated_at').notNull().defaultNow();
/** When the row was made and when it last changed. */
export const stamps = () => ({ createdAt: createdAt(), updatedAt: updatedAt() });
