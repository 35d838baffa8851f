import { sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { user } from './auth';

export const preferences = sqliteTable('preferences', {
  userId: text('user_id')
    .primaryKey()
    .references(() => user.id, { onDelete: 'cascade' }),
  units: text('units', { enum: ['metric', 'us'] })
    .notNull()
    .default('metric'),
});
