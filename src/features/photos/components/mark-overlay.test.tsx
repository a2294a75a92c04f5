import { render } from '@testing-library/react';
import { describe, expect, test } from 'vitest';
import { buildMark } from '#src/testing/photo-data.ts';
import { numberMarks } from '../lib/photo-labels.ts';
import { MarkOverlay } from './mark-overlay.tsx';

const size = { width: 1600, height: 1200 };

describe('MarkOverlay', () => {
  test('when marks are given in fractions, then they are drawn in the photo’s own pixel box', () => {
    const marks = numberMarks([
      buildMark({ kind: 'cold_shut', shape: 'box', x: 0.25, y: 0.5, width: 0.5, height: 0.25, createdAt: '2026-11-28T19:00:00.000Z' }),
      buildMark({ kind: 'gas_porosity', shape: 'point', x: 0.1, y: 0.2, createdAt: '2026-11-28T19:05:00.000Z' }),
    ]);
    const { container } = render(<MarkOverlay size={size} marks={marks} />);

    const svg = container.querySelector('svg')!;
    expect(svg.getAttribute('viewBox')).toBe('0 0 1600 1200');
    const box = container.querySelector(`[data-mark-id="${marks[0].id}"] rect`)!;
    expect([box.getAttribute('x'), box.getAttribute('y'), box.getAttribute('width'), box.getAttribute('height')]).toEqual(['400', '600', '800', '300']);
    const point = container.querySelector(`[data-mark-id="${marks[1].id}"] g`) as SVGGElement;
    expect(point.style.transform).toContain('translate(160px, 240px)');
  });

  test('when a mark is drawn, then its label carries the number, the group letter and the short name', () => {
    const marks = numberMarks([buildMark({ kind: 'cold_shut' }), buildMark({ kind: 'hot_tear', createdAt: '2026-11-28T20:00:00.000Z' })]);
    const { container } = render(<MarkOverlay size={size} marks={marks} />);
    const texts = (id: string) => [...container.querySelectorAll(`[data-mark-id="${id}"] text`)].map((t) => t.textContent);
    expect(texts(marks[0].id)).toEqual(['1', 'F', 'Cold shut']);
    expect(texts(marks[1].id)).toEqual(['2', 'C', 'Hot tear']);
  });

  test('when a mark is selected, then it alone is drawn emphasised', () => {
    const marks = numberMarks([buildMark(), buildMark({ createdAt: '2026-11-28T20:00:00.000Z' })]);
    const { container } = render(<MarkOverlay size={size} marks={marks} selectedId={marks[1].id} />);
    expect(container.querySelectorAll('[data-selected]')).toHaveLength(1);
    expect(container.querySelector('[data-selected]')?.getAttribute('data-mark-id')).toBe(marks[1].id);
  });
});
