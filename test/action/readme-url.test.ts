// The README link the views' definitions point to, from the variables the runner sets for a
// `uses:` step (GitHub Actions documentation, "Default environment variables":
// GITHUB_ACTION_REPOSITORY and GITHUB_ACTION_REF).
import { describe, expect, it } from 'vitest';
import { readmeUrl } from '../../src/shell/action-outputs.js';

describe('readmeUrl', () => {
  it('points at the README of the revision the workflow uses', () => {
    expect(readmeUrl({ GITHUB_ACTION_REPOSITORY: 'acme/netbrace', GITHUB_ACTION_REF: 'v1' })).toBe('https://github.com/acme/netbrace/blob/v1/README.md');
    expect(readmeUrl({ GITHUB_SERVER_URL: 'https://ghe.example', GITHUB_ACTION_REPOSITORY: 'acme/netbrace', GITHUB_ACTION_REF: 'releases/v1' })).toBe('https://ghe.example/acme/netbrace/blob/releases/v1/README.md');
  });
  it('gives none for a local action or a value that is not a plain name', () => {
    expect(readmeUrl({})).toBeUndefined();
    expect(readmeUrl({ GITHUB_ACTION_REPOSITORY: 'acme/netbrace', GITHUB_ACTION_REF: 'v1) [x](https://evil' })).toBeUndefined();
    expect(readmeUrl({ GITHUB_ACTION_REPOSITORY: 'acme/netbrace', GITHUB_ACTION_REF: '../../x' })).toBeUndefined();
  });
});
