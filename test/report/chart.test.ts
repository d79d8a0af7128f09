import { describe, expect, it } from 'vitest';
import { SaxesParser } from 'saxes';
import { envelopeChart, niceTicks, renderChartSvg } from '../../src/report/chart.js';
import { demoReport } from './demo-report.fixture.js';

const report = demoReport();
const backbone = report.files[0];
const head = backbone.head!;
const base = backbone.base!;

/** Well-formedness checked by an independent XML parser (saxes), plus the element names seen. */
function parseXml(xml: string): { names: string[]; attrs: Record<string, string>[] } {
  const names: string[] = [];
  const attrs: Record<string, string>[] = [];
  const parser = new SaxesParser({ xmlns: true });
  parser.on('opentag', (t) => {
    names.push(t.local);
    attrs.push(Object.fromEntries(Object.values(t.attributes).map((a) => [a.name, a.value])));
  });
  parser.write(xml).close();
  return { names, attrs };
}

describe('envelopeChart', () => {
  it('draws band, median, the same-kind attacks, the worst case and the base median', () => {
    const chart = envelopeChart(head.envelopes[0], head, base);
    expect(chart.series.map((s) => s.id)).toEqual([
      'band',
      'median',
      'attack:degree',
      'attack:betweenness-adaptive',
      'worst-case',
      'base-median',
    ]);
    const links = envelopeChart(head.envelopes[1], head, base);
    expect(links.series.map((s) => s.id)).toEqual(['band', 'median', 'attack:link-betweenness', 'base-median']);
  });

  it('leaves out the base median when there is no base, and the worst case when there is none', () => {
    const chart = envelopeChart(head.envelopes[1], head);
    expect(chart.series.map((s) => s.role)).toEqual(['band', 'median', 'attack']);
  });

  it('places worst-case step k at k/N and starts it at the median at x = 0', () => {
    const env = head.envelopes[0];
    const wc = envelopeChart(env, head, base).series.find((s) => s.role === 'worst-case')!;
    expect(wc.points[0]).toEqual({ x: 0, y: env.median[0] });
    expect(wc.points.slice(1).map((p) => p.x)).toEqual([1 / 52, 2 / 52, 3 / 52]);
    expect(wc.points.slice(1).map((p) => p.y)).toEqual(env.worstCase!.values);
  });

  it('clips attack curves to the envelope range, interpolating the end point', () => {
    const env = head.envelopes[0];
    const chart = envelopeChart(env, head, base);
    const attack = chart.series.find((s) => s.id === 'attack:degree')!;
    const xMax = env.x[env.x.length - 1];
    const last = attack.points[attack.points.length - 1];
    expect(last.x).toBeCloseTo(xMax, 12);
    const curve = head.attacks[0];
    const i = curve.x.findIndex((x) => x > xMax);
    const t = (xMax - curve.x[i - 1]) / (curve.x[i] - curve.x[i - 1]);
    expect(last.y).toBeCloseTo(curve.values[i - 1] + t * (curve.values[i] - curve.values[i - 1]), 12);
    expect(attack.points.every((p) => p.x <= xMax + 1e-12)).toBe(true);
  });

  it('uses the band quantiles named by the envelope', () => {
    const env = head.envelopes[0];
    const band = envelopeChart(env, head).series[0];
    expect(band.points.map((p) => p.y)).toEqual(env.quantiles['0.1'].value);
    expect(band.upper!.map((p) => p.y)).toEqual(env.quantiles['0.9'].value);
    expect(band.label).toBe('10\u201390 % band');
  });

  it('summarises the chart in words with the median end points', () => {
    const env = head.envelopes[0];
    const chart = envelopeChart(env, head, base);
    expect(chart.summary).toContain(
      `Median R falls from ${env.median[0].toFixed(3)} to ${env.median[env.median.length - 1].toFixed(3)}`,
    );
    expect(chart.summary).toContain('Worst case found (exact, 3 sites)');
  });
});

describe('renderChartSvg', () => {
  it('is well-formed XML with one element per series, a title and a description', () => {
    const chart = envelopeChart(head.envelopes[0], head, base);
    const svg = renderChartSvg(chart, { idPrefix: 'c1' });
    const { names, attrs } = parseXml(svg);
    expect(names[0]).toBe('svg');
    expect(attrs[0]['role']).toBe('img');
    expect(attrs[0]['aria-labelledby']).toBe('c1-title c1-desc');
    expect(names).toContain('title');
    expect(names).toContain('desc');
    const series = attrs.filter((a) => a['data-series']);
    expect(series.map((a) => a['data-id'])).toEqual(
      // draw order: band, base median, attacks, worst case, median on top
      ['band', 'base-median', 'attack:degree', 'attack:betweenness-adaptive', 'worst-case', 'median'],
    );
    expect(series.every((a) => (a['aria-label'] ?? '').length > 0)).toBe(true);
    expect(attrs[0]['data-series-count']).toBe('6');
  });

  it('names every drawn line in its own legend, with the label the series carries', () => {
    for (const env of head.envelopes) {
      const chart = envelopeChart(env, head, base);
      const svg = renderChartSvg(chart, { idPrefix: 'c2' });
      const legend = svg.slice(svg.indexOf('<g class="nb-legend"'));
      const entries = [...legend.matchAll(/<g data-legend="([^"]+)">[\s\S]*?<text[^>]*>([^<]*)<\/text>\s*<\/g>/g)].map(
        (m) => [m[1], m[2]],
      );
      expect(entries).toEqual(chart.series.map((s) => [s.id, s.label]));
    }
  });

  it('maps R = 1 to the top and R = 0 to the bottom of the plot', () => {
    const chart = {
      title: 't',
      xLabel: 'x',
      xUnit: 'fraction' as const,
      xMax: 1,
      summary: 's',
      series: [
        {
          role: 'median' as const,
          id: 'median',
          label: 'median',
          points: [
            { x: 0, y: 1 },
            { x: 1, y: 0 },
          ],
        },
      ],
    };
    const svg = renderChartSvg(chart, { width: 640 });
    // margins: left 56, right 20, top 18, plot height 240
    expect(svg).toContain('points="56,18 620,258"');
  });

  it('escapes text taken from the report', () => {
    const chart = envelopeChart(head.envelopes[0], head, base);
    chart.title = 'a <b> & "c"';
    const svg = renderChartSvg(chart);
    expect(svg).toContain('a &lt;b&gt; &amp; &quot;c&quot;');
    expect(() => parseXml(svg)).not.toThrow();
  });
});

describe('niceTicks', () => {
  it('chooses round steps that cover the axis', () => {
    expect(niceTicks(0.3)).toEqual([0, 0.1, 0.2, 0.3]);
    expect(niceTicks(1)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(niceTicks(50)).toEqual([0, 10, 20, 30, 40, 50]);
    expect(niceTicks(0)).toEqual([0]);
  });
});
