import { index, integer, real, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import type { ApplianceFields } from '@/shared/schemas/appliance';
import type { DcWiring } from '@/shared/schemas/dc-wiring';
import type {
  Controller,
  Generator,
  Inverter,
  PropaneTank,
  ShoreCharger,
  SolarArray,
  VehicleCharger,
} from '@/shared/schemas/rig';
import { user } from './auth';
import { trips } from './trips';

/**
 * A rig is either one of a user's saved rigs ("My rigs", tripId null) or the copy a trip runs on
 * (tripId set), so a trip's what-ifs never change a saved rig. The battery is in columns because
 * lists and summaries read it; the parts below it are read only as a whole, so they are JSON.
 */
export const rigs = sqliteTable(
  'rigs',
  {
    id: text('id').primaryKey(),
    ownerId: text('owner_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    tripId: text('trip_id').references(() => trips.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    chemistry: text('chemistry', { enum: ['lifepo4', 'agm', 'flooded'] }).notNull(),
    capacityAh: real('capacity_ah').notNull(),
    nominalV: real('nominal_v').notNull(),
    reservePct: real('reserve_pct'),
    initialSocPct: real('initial_soc_pct').notNull(),
    heatedSpace: integer('heated_space', { mode: 'boolean' }).notNull(),
    solarArrays: text('solar_arrays', { mode: 'json' }).$type<SolarArray[]>().notNull(),
    controller: text('controller', { mode: 'json' }).$type<Controller | null>(),
    inverter: text('inverter', { mode: 'json' }).$type<Inverter | null>(),
    shoreCharger: text('shore_charger', { mode: 'json' }).$type<ShoreCharger | null>(),
    vehicleCharger: text('vehicle_charger', { mode: 'json' }).$type<VehicleCharger | null>(),
    generator: text('generator', { mode: 'json' }).$type<Generator | null>(),
    propaneTanks: text('propane_tanks', { mode: 'json' }).$type<PropaneTank[]>().notNull(),
    // Null on rigs stored before DC runs existed: read as no runs on the rig's default basis.
    dcWiring: text('dc_wiring', { mode: 'json' }).$type<DcWiring>(),
    /** The living space for its heat balance; defaults are a 6 m touring caravan with two aboard. */
    cabinLengthM: real('cabin_length_m').notNull().default(6),
    cabinWidthM: real('cabin_width_m').notNull().default(2.3),
    cabinHeightM: real('cabin_height_m').notNull().default(2.1),
    insulation: text('insulation', { enum: ['basic', 'standard', 'four-season'] })
      .notNull()
      .default('standard'),
    occupants: integer('occupants').notNull().default(2),
    /** Roof area that could carry panels, m²; null reads as length × width (caps the solar a fix may add). */
    roofAreaM2: real('roof_area_m2'),
    /**
     * A saved rig's own appliance list (the household's usual loads), copied onto every trip made on it; read as a
     * whole, so JSON. Null on trips' rigs (a trip keeps its appliances in their own table) and on older saved rigs.
     */
    loads: text('loads', { mode: 'json' }).$type<ApplianceFields[]>(),
    version: integer('version').notNull().default(1),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    updatedAt: integer('updated_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (table) => [index('rigs_owner_idx').on(table.ownerId), index('rigs_trip_idx').on(table.tripId)],
);

export type RigRow = typeof rigs.$inferSelect;
