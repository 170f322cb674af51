// The table list drizzle-kit reads (drizzle.config.ts) and the schema object for queries.
export { timestamps, bytea } from './columns.js';
export { organisations } from './organisations.js';
export { users } from './users.js';
export { assets, assetMembers, memberRole } from './assets.js';
export { wells } from './wells.js';
export { logRuns } from './log-runs.js';
export { curves } from './curves.js';
export { auditLog } from './audit-log.js';
export { formations } from './formations.js';
export { wellTops } from './well-tops.js';
export { curveBindings } from './curve-bindings.js';
export { wellSurveys } from './well-surveys.js';
export { zoneParameters } from './zone-parameters.js';
export { reviewStatus } from './review.js';
export { interpretations } from './interpretations.js';
export { reservesCases } from './reserves-cases.js';
export { productionSeries, productionKind } from './production-series.js';
export { mailMessages, mailStatus } from './mail-messages.js';
