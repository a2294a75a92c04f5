import { describe, expect, test } from 'vitest';
import { bandStart, defectFrequencyOf, defectRatesByBand, monthsBetween, yieldTrendOf } from './insight-aggregates.ts';

describe('monthsBetween', () => {
  test('when the span crosses a new year, then every month is listed once', () => {
    expect(monthsBetween('2026-11', '2027-02')).toEqual(['2026-11', '2026-12', '2027-01', '2027-02']);
  });
});

describe('bandStart', () => {
  test.each([
    [719.9, 20, 700],
    [720, 20, 720],
    [0, 50, 0],
    [349, 50, 300],
  ])('when %d °C falls in %d °C bands, then the band starts at %d', (value, width, start) => {
    expect(bandStart(value, width)).toBe(start);
  });
});

describe('defectFrequencyOf', () => {
  test('when castings carry marks, then each month counts castings with the kind and marks, and quiet months stay', () => {
    const result = defectFrequencyOf([
      { pouredAt: '2026-09-05T10:00:00Z', markCounts: { gas_porosity: 3, cold_shut: 1 } },
      { pouredAt: '2026-09-20T10:00:00Z', markCounts: { gas_porosity: 1 } },
      { pouredAt: '2026-11-01T10:00:00Z', markCounts: {} },
      { pouredAt: '2026-11-02T10:00:00Z', markCounts: { no_longer_a_kind: 2 } },
    ]);
    expect(result.kinds).toEqual(['gas_porosity', 'cold_shut']);
    expect(result.months).toEqual([
      { month: '2026-09', castings: 2, kinds: [{ kind: 'gas_porosity', castings: 2, marks: 4 }, { kind: 'cold_shut', castings: 1, marks: 1 }] },
      { month: '2026-10', castings: 0, kinds: [] },
      { month: '2026-11', castings: 2, kinds: [] },
    ]);
  });
});

describe('defectRatesByBand', () => {
  test('when castings fall in bands, then each group’s share counts a casting once however many marks', () => {
    const result = defectRatesByBand(
      [
        { heatId: 'h1', valueC: 705, kinds: ['gas_porosity', 'pinholes'] },
        { heatId: 'h1', valueC: 705, kinds: [] },
        { heatId: 'h2', valueC: 728, kinds: ['shrinkage_porosity'] },
        { heatId: 'h3', valueC: null, kinds: ['gas_porosity'] },
      ],
      20,
    );
    expect(result.unrecorded.castings).toBe(1);
    expect(result.bands.map((b) => [b.fromC, b.toC, b.heats, b.castings])).toEqual([
      [700, 720, 1, 2],
      [720, 740, 1, 1],
    ]);
    expect(result.bands[0].rates.find((r) => r.key === 'gas')).toEqual({ key: 'gas', castings: 1, share: 0.5 });
    expect(result.bands[1].rates.find((r) => r.key === 'shrinkage')).toEqual({ key: 'shrinkage', castings: 1, share: 1 });
  });

  test('when a kind is chosen, then only that kind counts', () => {
    const result = defectRatesByBand([{ heatId: 'h1', valueC: 705, kinds: ['pinholes'] }], 20, { kind: 'gas_porosity' });
    expect(result).toMatchObject({ by: 'kind', keys: ['gas_porosity'] });
    expect(result.bands[0].rates).toEqual([{ key: 'gas_porosity', castings: 0, share: 0 }]);
  });
});

describe('yieldTrendOf', () => {
  test('when some heats are not fully weighed, then they are excluded and the rest give median and mean', () => {
    const result = yieldTrendOf([
      { pouredAt: '2026-10-01T10:00:00Z', chargeG: 1000, castingCount: 1, weighedCount: 1, castingsG: 600 },
      { pouredAt: '2026-10-02T10:00:00Z', chargeG: 1000, castingCount: 2, weighedCount: 2, castingsG: 800 },
      { pouredAt: '2026-10-03T10:00:00Z', chargeG: 1000, castingCount: 1, weighedCount: 1, castingsG: 400 },
      { pouredAt: '2026-10-04T10:00:00Z', chargeG: 1000, castingCount: 2, weighedCount: 1, castingsG: 300 },
      { pouredAt: '2026-10-05T10:00:00Z', chargeG: 1000, castingCount: 0, weighedCount: 0, castingsG: 0 },
    ]);
    expect(result.excluded).toBe(2);
    expect(result.months).toEqual([{ month: '2026-10', heats: 3, medianPct: 60, meanPct: 60 }]);
    expect(result.source).toContain('Giesserei-Lexikon');
  });
});
