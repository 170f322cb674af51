import { pgEnum } from 'drizzle-orm/pg-core';

/** Review states shared by interpretations and reserves cases. */
export const reviewStatus = pgEnum('review_status', ['draft', 'submitted', 'approved', 'returned']);
export type ReviewStatus = (typeof reviewStatus.enumValues)[number];
