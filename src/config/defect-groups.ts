import { DEFECT_GROUP_IDS, DEFECT_GROUPS as DOMAIN_DEFECT_GROUPS, type DefectGroupId, type LabelShape } from '#shared/domain/index.ts';

/**
 * How each defect group looks on screen. The trade core owns what a group
 * is (its name, letter and label shape, in shared/domain/defect-kinds.ts);
 * this file adds only the presentation: the outline colour of each group,
 * keyed by group id, and the SVG path of each label shape. Shape and letter
 * together keep marks apart for colour-blind users and in greyscale print.
 */
export const DEFECT_GROUPS = DEFECT_GROUP_IDS;
export type DefectGroup = DefectGroupId;
export type { LabelShape };

type GroupColours = {
  /** Tailwind classes on the theme's tokens (light and dark follow the theme). */
  colorClass: string;
  fillClass: string;
  borderClass: string;
  /**
   * The outline colour on a photo. Marks sit on a dark halo whatever the
   * theme, so they always use the lighter (dark-theme) value of the token;
   * the same hex values as `defect.*.dark` in tailwind.config.ts.
   */
  overlay: string;
};

const COLOURS: Record<DefectGroup, GroupColours> = {
  gas: { colorClass: 'text-defect-gas', fillClass: 'fill-defect-gas', borderClass: 'border-defect-gas', overlay: '#5AA9E6' },
  shrinkage: { colorClass: 'text-defect-shrinkage', fillClass: 'fill-defect-shrinkage', borderClass: 'border-defect-shrinkage', overlay: '#EE7A4F' },
  filling: { colorClass: 'text-defect-filling', fillClass: 'fill-defect-filling', borderClass: 'border-defect-filling', overlay: '#E9B53A' },
  inclusion: { colorClass: 'text-defect-inclusion', fillClass: 'fill-defect-inclusion', borderClass: 'border-defect-inclusion', overlay: '#BB8BE0' },
  surface: { colorClass: 'text-defect-surface', fillClass: 'fill-defect-surface', borderClass: 'border-defect-surface', overlay: '#35C2A6' },
  crack: { colorClass: 'text-defect-crack', fillClass: 'fill-defect-crack', borderClass: 'border-defect-crack', overlay: '#EE7DB9' },
  dimensional: { colorClass: 'text-defect-dimensional', fillClass: 'fill-defect-dimensional', borderClass: 'border-defect-dimensional', overlay: '#9AAAC0' },
};

export type DefectGroupLook = GroupColours & {
  /** The group's name, e.g. "Gas". */
  label: string;
  /** Its one-letter code, e.g. "G". */
  code: string;
  shape: LabelShape;
};

export const DEFECT_GROUP_LOOK: Record<DefectGroup, DefectGroupLook> = Object.fromEntries(
  DOMAIN_DEFECT_GROUPS.map((g) => [g.id, { label: g.name, code: g.code, shape: g.shape, ...COLOURS[g.id] }]),
) as Record<DefectGroup, DefectGroupLook>;

/** SVG path for each label shape in a 24×24 box. */
export const LABEL_SHAPE_PATHS: Record<LabelShape, string> = {
  circle: 'M12 2a10 10 0 1 0 0 20a10 10 0 1 0 0-20z',
  triangle: 'M12 2L22.5 21H1.5z',
  square: 'M3 3h18v18H3z',
  diamond: 'M12 1.5L22.5 12L12 22.5L1.5 12z',
  hexagon: 'M7 2.5h10l5 9.5l-5 9.5H7l-5-9.5z',
  cross: 'M7 1.5h10V7h5.5v10H17v5.5H7V17H1.5V7H7z',
  pentagon: 'M12 1.5l10.5 7.6l-4 12.4h-13l-4-12.4z',
};
