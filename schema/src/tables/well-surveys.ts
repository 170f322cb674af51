import { jsonb, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './columns.js';
import { users } from './users.js';
import { wells } from './wells.js';

export interface SurveyStation {
  md: number;
  inclination: number;
  azimuth: number;
}

/** The deviation survey of a well (stations of MD, inclination, azimuth in degrees). */
export const wellSurveys = pgTable('well_surveys', {
  wellId: uuid('well_id')
    .primaryKey()
    .references(() => wells.id, { onDelete: 'cascade' }),
  fileName: text('file_name').notNull(),
  depthUnit: text('depth_unit').notNull(),
  stations: jsonb('stations').$type<SurveyStation[]>().notNull(),
  uploadedBy: uuid('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
  ...timestamps,
});

export type WellSurvey = typeof wellSurveys.$inferSelect;
export type NewWellSurvey = typeof wellSurveys.$inferInsert;
