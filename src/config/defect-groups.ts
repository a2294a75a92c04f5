/**
 * How each defect group looks on screen: its outline colour (a tailwind
 * token), a two-letter code and a label shape, so marks stay apart for
 * colour-blind users and in greyscale print. Presentation only; the trade
 * meaning of each group belongs to the domain module in shared/.
 */
export const DEFECT_GROUPS = ['gas', 'shrinkage', 'filling', 'inclusion', 'surface', 'crack', 'dimensional'] as const;
export type DefectGroup = (typeof DEFECT_GROUPS)[number];

export type LabelShape = 'circle' | 'triangle' | 'square' | 'diamond' | 'hexagon' | 'bar' | 'pentagon';

export const DEFECT_GROUP_LOOK: Record<DefectGroup, { label: string; code: string; shape: LabelShape; colorClass: string; fillClass: string; borderClass: string }> = {
  gas: { label: 'Gas', code: 'Ga', shape: 'circle', colorClass: 'text-defect-gas', fillClass: 'fill-defect-gas', borderClass: 'border-defect-gas' },
  shrinkage: { label: 'Shrinkage', code: 'Sh', shape: 'triangle', colorClass: 'text-defect-shrinkage', fillClass: 'fill-defect-shrinkage', borderClass: 'border-defect-shrinkage' },
  filling: { label: 'Filling', code: 'Fi', shape: 'square', colorClass: 'text-defect-filling', fillClass: 'fill-defect-filling', borderClass: 'border-defect-filling' },
  inclusion: { label: 'Inclusion', code: 'In', shape: 'diamond', colorClass: 'text-defect-inclusion', fillClass: 'fill-defect-inclusion', borderClass: 'border-defect-inclusion' },
  surface: { label: 'Surface', code: 'Su', shape: 'hexagon', colorClass: 'text-defect-surface', fillClass: 'fill-defect-surface', borderClass: 'border-defect-surface' },
  crack: { label: 'Crack', code: 'Cr', shape: 'bar', colorClass: 'text-defect-crack', fillClass: 'fill-defect-crack', borderClass: 'border-defect-crack' },
  dimensional: { label: 'Dimensional', code: 'Di', shape: 'pentagon', colorClass: 'text-defect-dimensional', fillClass: 'fill-defect-dimensional', borderClass: 'border-defect-dimensional' },
};

/** SVG path for each label shape in a 24×24 box. */
export const LABEL_SHAPE_PATHS: Record<LabelShape, string> = {
  circle: 'M12 2a10 10 0 1 0 0 20a10 10 0 1 0 0-20z',
  triangle: 'M12 2L22.5 21H1.5z',
  square: 'M3 3h18v18H3z',
  diamond: 'M12 1.5L22.5 12L12 22.5L1.5 12z',
  hexagon: 'M7 2.5h10l5 9.5l-5 9.5H7l-5-9.5z',
  bar: 'M1.5 6h21v12h-21z',
  pentagon: 'M12 1.5l10.5 7.6l-4 12.4h-13l-4-12.4z',
};
