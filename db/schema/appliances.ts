import { index, integer, real, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import type { DaySelector, RoutineWindow } from '@/shared/schemas/common';
import { user } from './auth';
import { trips } from './trips';

export const appliances = sqliteTable(
  'appliances',
  {
    id: text('id').primaryKey(),
    tripId: text('trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    name: text('name').notNull(),
    circuit: text('circuit', { enum: ['ac', 'dc', 'fuel'] }).notNull(),
    quantity: integer('quantity').notNull(),
    runningW: real('running_w').notNull(),
    standbyW: real('standby_w').notNull(),
    dutyCycle: real('duty_cycle').notNull(),
    surgeW: real('surge_w'),
    heatInputW: real('heat_input_w').notNull(),
    scheduleKind: text('schedule_kind', { enum: ['always', 'routine', 'thermostat'] }).notNull(),
    thermostatMode: text('thermostat_mode', { enum: ['cooling', 'heating'] }),
    setPointC: real('set_point_c'),
    /** Thermostats: cooling COP or heating efficiency, and heat moved at full duty per unit (W); null for typical. */
    thermostatEfficiency: real('thermostat_efficiency'),
    thermostatCapacityW: real('thermostat_capacity_w'),
    /** The member who looks after this appliance's routine ("looked after by"). */
    caretakerUserId: text('caretaker_user_id').references(() => user.id, { onDelete: 'set null' }),
    version: integer('version').notNull().default(1),
  },
  (table) => [index('appliances_trip_idx').on(table.tripId)],
);

/**
 * An appliance's routine windows (or, for a thermostat, the windows it is active in), one row
 * each, so "who runs what when" can be listed per day without parsing JSON.
 */
export const routineWindows = sqliteTable(
  'routine_windows',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    applianceId: text('appliance_id')
      .notNull()
      .references(() => appliances.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    days: text('days', { mode: 'json' }).$type<DaySelector>().notNull(),
    startHour: integer('start_hour').notNull(),
    startMinute: integer('start_minute').notNull(),
    minutes: integer('minutes').notNull(),
  },
  (table) => [index('routine_windows_appliance_idx').on(table.applianceId)],
);

export type ApplianceRow = typeof appliances.$inferSelect;
export type RoutineWindowRow = typeof routineWindows.$inferSelect;
export type { RoutineWindow };
