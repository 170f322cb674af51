/**
 * Key scopes shared by features. Every query about a well lives under `wellScope`, every query
 * about an asset under `assetScope`, so a mutation whose effects cross features (a save changes
 * versions, zone tables and the audit log) invalidates one prefix instead of retyping keys.
 * The merged samples live outside these scopes on purpose: they are fetched once per session.
 */
export const assetScope = (assetId: string) => ['assets', assetId] as const;
export const wellScope = (assetId: string, wellId: string) => ['assets', assetId, 'wells', wellId] as const;

/**
 * Keys of lists that repeat names owned by another feature: the signed-in user ("me") and the
 * organisation's accounts both carry asset names in their memberships, so renaming an asset
 * (assets feature) or a user (admin feature) refreshes them through these.
 */
export const meKey = ['auth', 'me'] as const;
export const usersKey = ['users'] as const;
