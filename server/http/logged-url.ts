/**
 * The links we mail carry bearer tokens: an invitation or a password reset opens an account to whoever
 * holds it, a pack link opens a pack. The request log keeps the path and drops the token.
 */
const TOKEN_IN_PATH = /^(\/api\/(?:invitations|auth\/password-reset|pack-links)\/)[^/?#]+/;
const TOKEN_IN_QUERY = /([?&]token=)[^&#]*/g;

export function loggedUrl(url: string): string {
  return url.replace(TOKEN_IN_PATH, '$1[token]').replace(TOKEN_IN_QUERY, '$1[token]');
}
