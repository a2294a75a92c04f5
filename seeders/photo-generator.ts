import sharp from 'sharp';
import type { DefectKindId } from '../shared/domain/index.ts';

/**
 * Draws believable photos of ingots and small castings for the demo
 * workshop, with defects where the returned marks say they are. Everything
 * is drawn from a seed (SVG rendered by sharp), so the demo ships as code,
 * not as image files, and the same seed always draws the same photo.
 */

/** A small, fast, seedable PRNG (mulberry32). */
export function rng(seed: number) {
  let a = seed >>> 0;
  const next = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    next,
    between: (lo: number, hi: number) => lo + (hi - lo) * next(),
    int: (lo: number, hi: number) => Math.floor(lo + (hi - lo + 1) * next()),
    pick: <T>(items: readonly T[]): T => items[Math.floor(next() * items.length)],
  };
}
export type Rng = ReturnType<typeof rng>;

export const PIECE_SHAPES = ['bar-ingot', 'muffin-ingot', 'plate', 'disc'] as const;
export type PieceShape = (typeof PIECE_SHAPES)[number];

export type DrawnMark = {
  kind: DefectKindId;
  severity: 1 | 2 | 3;
  shape: 'point' | 'box';
  x: number;
  y: number;
  width?: number;
  height?: number;
};

export type DrawnPhoto = { jpeg: Buffer; width: number; height: number; marks: DrawnMark[] };

type Box = { x: number; y: number; w: number; h: number };

const W = 1200;
const H = 900;

const SURFACES = [
  { name: 'concrete', base: '#8d8a84', grain: 0.9 },
  { name: 'plywood', base: '#a07a52', grain: 0.35 },
  { name: 'steel bench', base: '#5b5f63', grain: 0.6 },
  { name: 'fire brick', base: '#b98f6a', grain: 1.2 },
] as const;

function pieceOutline(shape: PieceShape, box: Box, rounded: number): string {
  const { x, y, w, h } = box;
  if (shape === 'disc') return `<ellipse cx="${x + w / 2}" cy="${y + h / 2}" rx="${w / 2}" ry="${h / 2}"/>`;
  if (shape === 'muffin-ingot') {
    // A truncated cone seen from above at an angle: wider top edge.
    const inset = w * 0.12;
    return `<path d="M${x + inset},${y + h} L${x + w - inset},${y + h} Q${x + w},${y + h} ${x + w},${y + h - rounded}
      L${x + w},${y + rounded} Q${x + w},${y} ${x + w - rounded},${y} L${x + rounded},${y} Q${x},${y} ${x},${y + rounded}
      L${x},${y + h - rounded} Q${x},${y + h} ${x + inset},${y + h} Z"/>`;
  }
  const r = shape === 'plate' ? Math.min(rounded, 18) : rounded;
  return `<rect x="${x}" y="${y}" width="${w}" height="${h}" rx="${r}" ry="${r}"/>`;
}

function frac(v: number, total: number) {
  return Math.min(1, Math.max(0, v / total));
}

/** The defects this generator can draw, and how each looks. */
const DRAW: Partial<Record<DefectKindId, (r: Rng, piece: Box, severity: 1 | 2 | 3) => { svg: string; mark: DrawnMark }>> = {
  gas_porosity: (r, p, sev) => {
    const cx = r.between(p.x + p.w * 0.25, p.x + p.w * 0.75);
    const cy = r.between(p.y + p.h * 0.2, p.y + p.h * 0.5);
    const spread = 40 + sev * 30;
    const holes = Array.from({ length: 8 + sev * 10 }, () => {
      const hx = cx + r.between(-spread, spread);
      const hy = cy + r.between(-spread * 0.6, spread * 0.6);
      const hr = r.between(2, 4 + sev * 2);
      return `<circle cx="${hx}" cy="${hy}" r="${hr}" fill="#2b2c2e"/><circle cx="${hx - hr * 0.3}" cy="${hy - hr * 0.3}" r="${hr * 0.35}" fill="#e9ecef" opacity="0.55"/>`;
    }).join('');
    return {
      svg: holes,
      mark: { kind: 'gas_porosity', severity: sev, shape: 'box', x: frac(cx - spread, W), y: frac(cy - spread * 0.6, H), width: frac(spread * 2, W), height: frac(spread * 1.2, H) },
    };
  },
  pinholes: (r, p, sev) => {
    const holes = Array.from({ length: 25 + sev * 20 }, () => {
      const hx = r.between(p.x + 20, p.x + p.w - 20);
      const hy = r.between(p.y + 15, p.y + p.h * 0.35);
      return `<circle cx="${hx}" cy="${hy}" r="${r.between(1, 2.2)}" fill="#303234"/>`;
    }).join('');
    return {
      svg: holes,
      mark: { kind: 'pinholes', severity: sev, shape: 'box', x: frac(p.x + 20, W), y: frac(p.y + 15, H), width: frac(p.w - 40, W), height: frac(p.h * 0.35 - 15, H) },
    };
  },
  blowholes: (r, p, sev) => {
    const cx = r.between(p.x + p.w * 0.2, p.x + p.w * 0.8);
    const cy = r.between(p.y + p.h * 0.15, p.y + p.h * 0.4);
    const rad = 10 + sev * 8;
    return {
      svg: `<ellipse cx="${cx}" cy="${cy}" rx="${rad}" ry="${rad * 0.8}" fill="url(#crater)"/><ellipse cx="${cx}" cy="${cy}" rx="${rad}" ry="${rad * 0.8}" fill="none" stroke="#f1f3f5" stroke-opacity="0.5" stroke-width="2"/>`,
      mark: { kind: 'blowholes', severity: sev, shape: 'point', x: frac(cx, W), y: frac(cy, H) },
    };
  },
  shrinkage_sink: (r, p, sev) => {
    const cx = p.x + p.w * r.between(0.4, 0.6);
    const cy = p.y + p.h * r.between(0.4, 0.6);
    const rx = p.w * (0.12 + sev * 0.05);
    const ry = p.h * (0.1 + sev * 0.04);
    return {
      svg: `<ellipse cx="${cx}" cy="${cy}" rx="${rx}" ry="${ry}" fill="url(#sink)"/>`,
      mark: { kind: 'shrinkage_sink', severity: sev, shape: 'box', x: frac(cx - rx, W), y: frac(cy - ry, H), width: frac(rx * 2, W), height: frac(ry * 2, H) },
    };
  },
  ingot_pipe: (r, p, sev) => {
    const cx = p.x + p.w * r.between(0.45, 0.55);
    const cy = p.y + p.h * 0.5;
    const len = p.w * (0.15 + sev * 0.08);
    return {
      svg: `<path d="M${cx - len / 2},${cy} Q${cx},${cy - 14 - sev * 4} ${cx + len / 2},${cy} Q${cx},${cy + 10 + sev * 4} ${cx - len / 2},${cy} Z" fill="#1f2022"/>`,
      mark: { kind: 'ingot_pipe', severity: sev, shape: 'box', x: frac(cx - len / 2 - 10, W), y: frac(cy - 30, H), width: frac(len + 20, W), height: frac(60, H) },
    };
  },
  cold_shut: (r, p, sev) => {
    const y0 = p.y + p.h * r.between(0.3, 0.7);
    let d = `M${p.x + 10},${y0}`;
    for (let i = 1; i <= 8; i++) d += ` Q${p.x + (p.w * (i - 0.5)) / 8},${y0 + r.between(-18, 18)} ${p.x + (p.w * i) / 8 - 10},${y0 + r.between(-8, 8)}`;
    return {
      svg: `<path d="${d}" fill="none" stroke="#3a3c3f" stroke-width="${2 + sev}" stroke-linecap="round"/><path d="${d}" fill="none" stroke="#f8f9fa" stroke-opacity="0.35" stroke-width="1" transform="translate(0,-3)"/>`,
      mark: { kind: 'cold_shut', severity: sev, shape: 'box', x: frac(p.x, W), y: frac(y0 - 30, H), width: frac(p.w, W), height: frac(60, H) },
    };
  },
  laps: (r, p, sev) => {
    const lines = Array.from({ length: 3 + sev * 2 }, (_, i) => {
      const y = p.y + p.h * 0.15 + i * 14;
      return `<path d="M${p.x + 20},${y} C${p.x + p.w * 0.3},${y - 10} ${p.x + p.w * 0.6},${y + 10} ${p.x + p.w - 20},${y}" fill="none" stroke="#6c7075" stroke-width="2" opacity="0.8"/>`;
    }).join('');
    void r;
    return {
      svg: lines,
      mark: { kind: 'laps', severity: sev, shape: 'box', x: frac(p.x + 20, W), y: frac(p.y + p.h * 0.12, H), width: frac(p.w - 40, W), height: frac((3 + sev * 2) * 14 + 10, H) },
    };
  },
  rounded_edges: (_r, p, sev) => ({
    svg: '',
    mark: { kind: 'rounded_edges', severity: sev, shape: 'box', x: frac(p.x - 10, W), y: frac(p.y - 10, H), width: frac(p.w * 0.25, W), height: frac(p.h * 0.3, H) },
  }),
  misrun: (r, p, sev) => {
    const cw = p.w * (0.12 + sev * 0.06);
    const ch = p.h * (0.25 + sev * 0.08);
    const x = p.x + p.w - cw;
    const y = p.y + p.h - ch;
    void r;
    return {
      // The missing corner: the bench shows through, with a rounded flow front.
      svg: `<path d="M${x + cw + 2},${y} Q${x},${y} ${x},${y + ch + 2} L${x + cw + 2},${y + ch + 2} Z" fill="url(#bench)"/>`,
      mark: { kind: 'misrun', severity: sev, shape: 'box', x: frac(x - 20, W), y: frac(y - 20, H), width: frac(cw + 30, W), height: frac(ch + 30, H) },
    };
  },
  rough_surface: (r, p, sev) => {
    const bx = p.x + p.w * r.between(0.05, 0.4);
    const by = p.y + p.h * r.between(0.3, 0.5);
    const bw = p.w * 0.45;
    const bh = p.h * 0.4;
    return {
      svg: `<rect x="${bx}" y="${by}" width="${bw}" height="${bh}" rx="20" filter="url(#rough)" opacity="${0.35 + sev * 0.15}" fill="#9ea3a8"/>`,
      mark: { kind: 'rough_surface', severity: sev, shape: 'box', x: frac(bx, W), y: frac(by, H), width: frac(bw, W), height: frac(bh, H) },
    };
  },
  dross_inclusions: (r, p, sev) => {
    const cx = r.between(p.x + p.w * 0.2, p.x + p.w * 0.8);
    const cy = r.between(p.y + p.h * 0.1, p.y + p.h * 0.3);
    const blobs = Array.from({ length: 3 + sev * 2 }, () => {
      const bx = cx + r.between(-40, 40);
      const by = cy + r.between(-18, 18);
      const pts = Array.from({ length: 6 }, (_, i) => {
        const a = (i / 6) * Math.PI * 2;
        const rad = r.between(4, 10 + sev * 3);
        return `${bx + Math.cos(a) * rad},${by + Math.sin(a) * rad * 0.7}`;
      }).join(' ');
      return `<polygon points="${pts}" fill="#3b3530" opacity="0.9"/>`;
    }).join('');
    return {
      svg: blobs,
      mark: { kind: 'dross_inclusions', severity: sev, shape: 'box', x: frac(cx - 55, W), y: frac(cy - 30, H), width: frac(110, W), height: frac(60, H) },
    };
  },
  oxide_inclusions: (r, p, sev) => {
    const x0 = r.between(p.x + p.w * 0.15, p.x + p.w * 0.5);
    const y0 = r.between(p.y + p.h * 0.3, p.y + p.h * 0.6);
    const folds = Array.from({ length: 2 + sev }, (_, i) => `<path d="M${x0},${y0 + i * 9} c20,-6 40,8 60,0 s40,-8 70,2" fill="none" stroke="#7d7a73" stroke-width="3" opacity="0.75"/>`).join('');
    return {
      svg: folds,
      mark: { kind: 'oxide_inclusions', severity: sev, shape: 'box', x: frac(x0 - 10, W), y: frac(y0 - 15, H), width: frac(150, W), height: frac(30 + sev * 9, H) },
    };
  },
  hot_tear: (r, p, sev) => {
    let x = p.x + p.w * r.between(0.3, 0.7);
    let y = p.y + 4;
    let d = `M${x},${y}`;
    const steps = 6 + sev * 2;
    for (let i = 0; i < steps; i++) {
      x += r.between(-14, 14);
      y += (p.h * (0.35 + sev * 0.1)) / steps;
      d += ` L${x},${y}`;
    }
    return {
      svg: `<path d="${d}" fill="none" stroke="#2a221c" stroke-width="${2 + sev}" stroke-linejoin="miter"/><path d="${d}" fill="none" stroke="#8a6a3e" stroke-width="1" opacity="0.6" transform="translate(1.5,0)"/>`,
      mark: { kind: 'hot_tear', severity: sev, shape: 'box', x: frac(x - 50, W), y: frac(p.y, H), width: frac(100, W), height: frac(y - p.y + 10, H) },
    };
  },
  cold_crack: (r, p, sev) => {
    const x1 = p.x + p.w * r.between(0.2, 0.4);
    const x2 = x1 + p.w * r.between(0.15, 0.3);
    const y1 = p.y + p.h * 0.1;
    const y2 = p.y + p.h * (0.5 + sev * 0.12);
    return {
      svg: `<line x1="${x1}" y1="${y1}" x2="${x2}" y2="${y2}" stroke="#1c1d1f" stroke-width="${1.5 + sev * 0.8}"/><line x1="${x1 + 1.5}" y1="${y1}" x2="${x2 + 1.5}" y2="${y2}" stroke="#fdfdfd" stroke-width="0.8" opacity="0.7"/>`,
      mark: { kind: 'cold_crack', severity: sev, shape: 'box', x: frac(Math.min(x1, x2) - 15, W), y: frac(y1 - 10, H), width: frac(Math.abs(x2 - x1) + 30, W), height: frac(y2 - y1 + 20, H) },
    };
  },
};

export const DRAWABLE_KINDS = Object.keys(DRAW) as DefectKindId[];

/**
 * One photo of a piece on a bench with the given defects. Light direction,
 * exposure, surface, framing and the piece's tilt vary with the seed.
 */
export async function drawPiecePhoto(opts: {
  seed: number;
  shape: PieceShape;
  defects: { kind: DefectKindId; severity: 1 | 2 | 3 }[];
  /** 'bronze' and 'zinc' tint the metal; default aluminium. */
  metal?: 'aluminium' | 'bronze' | 'zinc';
}): Promise<DrawnPhoto> {
  const r = rng(opts.seed);
  const surface = r.pick(SURFACES);
  const lightAngle = r.between(0, 360);
  const exposure = r.between(0.85, 1.15);
  const wantsRound = opts.defects.some((d) => d.kind === 'rounded_edges');
  const rounded = wantsRound ? r.between(55, 80) : r.between(6, 14);
  const aspect = opts.shape === 'disc' ? 1 : opts.shape === 'plate' ? 1.4 : opts.shape === 'muffin-ingot' ? 1.3 : 2.4;
  const pw = r.between(600, 820);
  const ph = Math.min(640, pw / aspect);
  const piece: Box = { x: (W - pw) / 2 + r.between(-60, 60), y: (H - ph) / 2 + r.between(-40, 40), w: pw, h: ph };
  const tilt = r.between(-6, 6);
  const metal =
    opts.metal === 'bronze'
      ? ['#c89b5b', '#8c6a3a', '#e5c48e']
      : opts.metal === 'zinc'
        ? ['#a9b0b6', '#7c8389', '#d7dce0']
        : ['#c5c9cd', '#8f959b', '#eef0f2'];

  const drawn = opts.defects.map((d) => {
    const draw = DRAW[d.kind];
    if (!draw) throw new Error(`the demo photo generator cannot draw ${d.kind}`);
    return draw(r, piece, d.severity);
  });

  const dx = Math.cos((lightAngle * Math.PI) / 180);
  const dy = Math.sin((lightAngle * Math.PI) / 180);
  const thickness = opts.shape === 'plate' || opts.shape === 'disc' ? r.between(14, 24) : r.between(34, 52);
  const outline = pieceOutline(opts.shape, piece, rounded);
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}">
  <defs>
    <filter id="noise" x="0" y="0" width="100%" height="100%">
      <feTurbulence type="fractalNoise" baseFrequency="${surface.grain}" numOctaves="3" seed="${opts.seed % 997}"/>
      <feColorMatrix type="saturate" values="0"/>
    </filter>
    <filter id="blotch" x="0" y="0" width="100%" height="100%">
      <feTurbulence type="fractalNoise" baseFrequency="0.012" numOctaves="2" seed="${(opts.seed * 3) % 977}"/>
      <feColorMatrix type="saturate" values="0"/>
    </filter>
    <filter id="rough" x="0" y="0" width="100%" height="100%">
      <feTurbulence type="turbulence" baseFrequency="0.35" numOctaves="3" seed="${(opts.seed * 7) % 991}"/>
      <feColorMatrix type="saturate" values="0"/>
      <feComposite in2="SourceGraphic" operator="in"/>
    </filter>
    <filter id="skin" x="0" y="0" width="100%" height="100%">
      <feTurbulence type="fractalNoise" baseFrequency="0.04" numOctaves="4" seed="${(opts.seed * 13) % 983}"/>
      <feColorMatrix type="saturate" values="0"/>
      <feComposite in2="SourceGraphic" operator="in"/>
    </filter>
    <filter id="soft"><feGaussianBlur stdDeviation="9"/></filter>
    <linearGradient id="metal" x1="${0.5 - dx / 2}" y1="${0.5 - dy / 2}" x2="${0.5 + dx / 2}" y2="${0.5 + dy / 2}">
      <stop offset="0" stop-color="${metal[2]}"/><stop offset="0.55" stop-color="${metal[0]}"/><stop offset="1" stop-color="${metal[1]}"/>
    </linearGradient>
    <linearGradient id="side" x1="0" y1="0" x2="0" y2="1">
      <stop offset="0" stop-color="${metal[1]}"/><stop offset="1" stop-color="#3d4145"/>
    </linearGradient>
    <linearGradient id="rim" x1="${0.5 - dx / 2}" y1="${0.5 - dy / 2}" x2="${0.5 + dx / 2}" y2="${0.5 + dy / 2}">
      <stop offset="0" stop-color="#ffffff" stop-opacity="0.9"/><stop offset="0.5" stop-color="#ffffff" stop-opacity="0.1"/><stop offset="1" stop-color="#000000" stop-opacity="0.45"/>
    </linearGradient>
    <radialGradient id="sink"><stop offset="0" stop-color="#5f656b"/><stop offset="0.7" stop-color="#8f959b" stop-opacity="0.7"/><stop offset="1" stop-color="#c5c9cd" stop-opacity="0"/></radialGradient>
    <radialGradient id="crater"><stop offset="0" stop-color="#202124"/><stop offset="0.75" stop-color="#4a4d51"/><stop offset="1" stop-color="#9aa0a6"/></radialGradient>
    <pattern id="bench" width="${W}" height="${H}" patternUnits="userSpaceOnUse"><rect width="${W}" height="${H}" fill="${surface.base}"/><rect width="${W}" height="${H}" filter="url(#noise)" opacity="0.28"/></pattern>
    <radialGradient id="vignette" cx="${0.5 + dx * 0.15}" cy="${0.5 + dy * 0.15}" r="0.8"><stop offset="0.5" stop-color="#000" stop-opacity="0"/><stop offset="1" stop-color="#000" stop-opacity="0.5"/></radialGradient>
  </defs>
  <rect width="${W}" height="${H}" fill="url(#bench)"/>
  <rect width="${W}" height="${H}" filter="url(#blotch)" opacity="0.18"/>
  <g transform="rotate(${tilt} ${W / 2} ${H / 2})">
    <g fill="#000" opacity="0.45" filter="url(#soft)" transform="translate(${-dx * 22},${thickness + 14 - dy * 10})">${outline}</g>
    <g fill="url(#side)" transform="translate(0,${thickness})">${outline}</g>
    <g fill="url(#metal)">${outline}</g>
    <g fill="#fff" filter="url(#skin)" opacity="0.32">${outline}</g>
    ${drawn.map((d) => d.svg).join('\n')}
    <g fill="none" stroke="url(#rim)" stroke-width="3">${outline}</g>
  </g>
  <rect width="${W}" height="${H}" fill="url(#vignette)"/>
</svg>`;
  const jpeg = await sharp(Buffer.from(svg))
    .modulate({ brightness: exposure })
    .jpeg({ quality: 84 })
    .toBuffer();
  // Marks follow the piece's tilt closely enough at ±6°: they are drawn boxes, not outlines.
  return { jpeg, width: W, height: H, marks: drawn.map((d) => d.mark) };
}
