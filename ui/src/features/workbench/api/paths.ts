/** API paths of a well and an asset (ids URL-encoded). */
export const assetPath = (assetId: string) => `/assets/${encodeURIComponent(assetId)}`;
export const wellPath = (assetId: string, wellId: string) => `${assetPath(assetId)}/wells/${encodeURIComponent(wellId)}`;
