// The README link the views' definitions point to, from the variables the runner sets for a
// `uses:` step (GitHub Actions documentation, "Default environment variables":
// GITHUB_ACTION_REPOSITORY and GITHUB_ACTION_REF).
import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { renderHtml } from '../../src/report/html.js';
import type { ActionDeps } from '../../src/shell/action-deps.js';
import { readInputs } from '../../src/shell/action-inputs.js';
import { sampleReport } from '../report/sample-report.js';
import { readmeUrl, writeArtifacts } from '../../src/shell/action-outputs.js';

describe('readmeUrl', () => {
  it('points at the README of the revision the workflow uses', () => {
    expect(readmeUrl({ GITHUB_ACTION_REPOSITORY: 'acme/netbrace', GITHUB_ACTION_REF: 'v1' })).toBe(
      'https://github.com/acme/netbrace/blob/v1/README.md',
    );
    expect(
      readmeUrl({
        GITHUB_SERVER_URL: 'https://ghe.example',
        GITHUB_ACTION_REPOSITORY: 'acme/netbrace',
        GITHUB_ACTION_REF: 'releases/v1',
      }),
    ).toBe('https://ghe.example/acme/netbrace/blob/releases/v1/README.md');
  });
  it('gives none for a local action or a value that is not a plain name', () => {
    expect(readmeUrl({})).toBeUndefined();
    expect(
      readmeUrl({ GITHUB_ACTION_REPOSITORY: 'acme/netbrace', GITHUB_ACTION_REF: 'v1) [x](https://evil' }),
    ).toBeUndefined();
    expect(readmeUrl({ GITHUB_ACTION_REPOSITORY: 'acme/netbrace', GITHUB_ACTION_REF: '../../x' })).toBeUndefined();
  });
});

describe('the HTML artifact links its definitions to that README', () => {
  it('passes the address to the HTML view', () => {
    const workspace = mkdtempSync(path.join(tmpdir(), 'netbrace-html-'));
    try {
      const inputs = readInputs({ INPUT_HTML: 'report.html', INPUT_REPORT: '' });
      const report = sampleReport();
      const url = readmeUrl({ GITHUB_ACTION_REPOSITORY: 'acme/netbrace', GITHUB_ACTION_REF: 'v1' });
      const files = writeArtifacts({ renderHtml } as unknown as ActionDeps, workspace, inputs, report, false, url);
      const html = readFileSync(path.join(workspace, files.html), 'utf8');
      expect(html).toContain('href="https://github.com/acme/netbrace/blob/v1/README.md#');
      const without = writeArtifacts({ renderHtml } as unknown as ActionDeps, workspace, inputs, report, false);
      expect(readFileSync(path.join(workspace, without.html), 'utf8')).not.toContain(
        'https://github.com/acme/netbrace',
      );
    } finally {
      rmSync(workspace, { recursive: true, force: true });
    }
  });
});
