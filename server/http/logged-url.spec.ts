import { describe, expect, it } from 'vitest';
import { loggedUrl } from './logged-url';

const TOKEN = 'ohYpn-W3zEURos-JoL5BQm2aSPTp0QrZFkpUivAZ3cE';

describe('loggedUrl', () => {
  it('drops the tokens of mailed links, in the API path and in the page address', () => {
    expect(loggedUrl(`/api/invitations/${TOKEN}`)).toBe('/api/invitations/[token]');
    expect(loggedUrl(`/api/invitations/${TOKEN}/accept`)).toBe('/api/invitations/[token]/accept');
    expect(loggedUrl(`/api/auth/password-reset/${TOKEN}`)).toBe('/api/auth/password-reset/[token]');
    expect(loggedUrl(`/api/pack-links/${TOKEN}.c2lnbmF0dXJl`)).toBe('/api/pack-links/[token]');
    expect(loggedUrl(`/accept-invitation?token=${TOKEN}`)).toBe('/accept-invitation?token=[token]');
    expect(loggedUrl(`/reset-password?from=mail&token=${TOKEN}#top`)).toBe('/reset-password?from=mail&token=[token]#top');
  });

  it('leaves every other address as it is', () => {
    for (const url of ['/api/auth/password-reset', '/api/jobs/12/pack.zip?paper=a4', '/api/team/invitations/3', '/jobs?tokens=2']) {
      expect(loggedUrl(url)).toBe(url);
    }
  });
});
