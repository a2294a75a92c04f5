import { z } from 'zod';
import { PUBLICATIONS, commonPractice, primary, secondary } from './sources.ts';
import type { SourceNote } from './sources.ts';

export const DEFECT_GROUP_IDS = ['gas', 'shrinkage', 'filling', 'inclusion', 'surface', 'crack', 'dimensional'] as const;
export type DefectGroupId = (typeof DEFECT_GROUP_IDS)[number];

export const LABEL_SHAPES = ['circle', 'triangle', 'square', 'diamond', 'hexagon', 'cross', 'pentagon'] as const;
export type LabelShape = (typeof LABEL_SHAPES)[number];

export type DefectGroup = { id: DefectGroupId; name: string; code: string; shape: LabelShape };

/**
 * Each group gets its own letter and label shape, so marks stay apart for
 * colour-blind users and in greyscale print. Surface is "R" (rough skin)
 * because "S" belongs to shrinkage.
 */
export const DEFECT_GROUPS: readonly DefectGroup[] = [
  { id: 'gas', name: 'Gas', code: 'G', shape: 'circle' },
  { id: 'shrinkage', name: 'Shrinkage', code: 'S', shape: 'triangle' },
  { id: 'filling', name: 'Filling', code: 'F', shape: 'square' },
  { id: 'inclusion', name: 'Inclusion', code: 'I', shape: 'diamond' },
  { id: 'surface', name: 'Surface', code: 'R', shape: 'hexagon' },
  { id: 'crack', name: 'Crack', code: 'C', shape: 'cross' },
  { id: 'dimensional', name: 'Dimensional', code: 'D', shape: 'pentagon' },
];

export const CIATF_GROUP_IDS = ['A', 'B', 'C', 'D', 'E', 'F', 'G'] as const;
export type CiatfGroup = (typeof CIATF_GROUP_IDS)[number];

/** The seven letter groups of the International Atlas of Casting Defects. */
export const CIATF_GROUPS: Record<CiatfGroup, string> = {
  A: 'Metallic projections',
  B: 'Cavities',
  C: 'Discontinuities',
  D: 'Defective surface',
  E: 'Incomplete casting',
  F: 'Incorrect dimensions or shape',
  G: 'Inclusions or structural anomalies',
};
export const CIATF_GROUPS_SOURCE: SourceNote = primary(`${PUBLICATIONS.asmVol15Defects}, abstract`);

export const DEFECT_KIND_IDS = [
  'gas_porosity',
  'pinholes',
  'blowholes',
  'shrinkage_porosity',
  'shrinkage_sink',
  'ingot_pipe',
  'cold_shut',
  'laps',
  'misrun',
  'rounded_edges',
  'oxide_inclusions',
  'dross_inclusions',
  'sand_inclusions',
  'hard_spots',
  'rough_surface',
  'metal_penetration',
  'scab',
  'rat_tail',
  'veining',
  'exudation',
  'hot_tear',
  'cold_crack',
  'flash',
  'warpage',
] as const;
export type DefectKindId = (typeof DEFECT_KIND_IDS)[number];
export const defectKindIdSchema = z.enum(DEFECT_KIND_IDS);

export type DefectKind = {
  id: DefectKindId;
  /** The trade's name. */
  name: string;
  /** Label on a photo mark, at most 14 characters. */
  shortName: string;
  group: DefectGroupId;
  /** What to look for on a photo of an ingot or casting. */
  recognise: string;
  /** Where it usually shows. */
  where: string;
  /** International Atlas of Casting Defects letter group, where one is established. */
  ciatfGroup?: CiatfGroup;
  /** Everyday words people use for it, for fuzzy search. */
  synonyms: string[];
  source: SourceNote;
};

const CATALOGUE = `${PUBLICATIONS.asmVol15Defects}; ${PUBLICATIONS.campbell2003}`;
const describedIn = (detail?: string): SourceNote =>
  commonPractice(`foundry defect descriptions as summarised in ${CATALOGUE}${detail ? `; ${detail}` : ''}`);

export const DEFECT_KINDS: readonly DefectKind[] = [
  {
    id: 'gas_porosity',
    name: 'Gas porosity (hydrogen)',
    shortName: 'Gas porosity',
    group: 'gas',
    recognise:
      'Round holes with smooth, often shiny walls, usually under a millimetre and spread fairly evenly; an ingot poured hot may show raised blisters or froth on top.',
    where: 'Throughout the section, gathering just under the top face and in the last metal to freeze.',
    ciatfGroup: 'B',
    synonyms: ['bubbles', 'holes', 'pores', 'porosity', 'swiss cheese', 'spongy', 'blisters', 'froth', 'gassy'],
    source: describedIn('smooth walls separate gas from shrinkage'),
  },
  {
    id: 'pinholes',
    name: 'Pinholes',
    shortName: 'Pinholes',
    group: 'gas',
    recognise: 'Many tiny round holes, pin-prick size, often showing only once the skin is machined or sanded.',
    where: 'Just below the skin, especially on upper faces and faces against a damp mould.',
    ciatfGroup: 'B',
    synonyms: ['pin holes', 'tiny holes', 'pricks', 'specks', 'pits', 'pepper holes', 'holes'],
    source: describedIn(),
  },
  {
    id: 'blowholes',
    name: 'Blowholes (blows)',
    shortName: 'Blowhole',
    group: 'gas',
    recognise:
      'One or a few large smooth cavities, millimetres to centimetres across, sometimes discoloured inside; where one breaks the surface it leaves a crater.',
    where: 'Upper part of the casting, beside cores and next to damp spots of the mould.',
    ciatfGroup: 'B',
    synonyms: ['blow', 'big bubble', 'bubble', 'void', 'crater', 'cavity', 'hole', 'open blow'],
    source: describedIn('gas from the mould or core rather than the melt'),
  },
  {
    id: 'shrinkage_porosity',
    name: 'Shrinkage porosity',
    shortName: 'Shrink pores',
    group: 'shrinkage',
    recognise:
      'Jagged, branching voids with rough crystalline walls where dendrite tips can be seen; on a machined face a cluster of irregular holes that leaks under pressure.',
    where: 'Heavy sections, junctions (hot spots), under undersized risers and along the centreline of plates.',
    ciatfGroup: 'B',
    synonyms: ['shrink', 'sponge', 'spongy', 'jagged holes', 'leaker', 'leaks', 'porous', 'holes', 'cracks inside'],
    source: describedIn(),
  },
  {
    id: 'shrinkage_sink',
    name: 'Shrinkage sink (surface draw)',
    shortName: 'Shrink sink',
    group: 'shrinkage',
    recognise: 'A smooth, shallow dish pulled into a flat face; the edges fade into the surrounding surface.',
    where: 'Flat faces over a heavy section, and the tops of ingots and open-mould castings.',
    ciatfGroup: 'B',
    synonyms: ['sink', 'dent', 'divot', 'dip', 'depression', 'suck-in', 'dimple', 'hollow'],
    source: describedIn('the atlas also files surface depressions under F, incorrect shape'),
  },
  {
    id: 'ingot_pipe',
    name: 'Pipe (primary shrinkage cavity)',
    shortName: 'Ingot pipe',
    group: 'shrinkage',
    recognise:
      'A funnel-shaped hole running down from the top centre of an ingot or riser; normal in a riser, a defect when it reaches the useful length.',
    where: 'Top centre of ingots and risers fed from above.',
    ciatfGroup: 'B',
    synonyms: ['pipe', 'funnel', 'crater', 'hollow top', 'dip', 'cavity', 'hole'],
    source: describedIn(),
  },
  {
    id: 'cold_shut',
    name: 'Cold shut (cold lap)',
    shortName: 'Cold shut',
    group: 'filling',
    recognise:
      'A seam or crease with rounded edges where two streams met without fusing; the line may be wavy, and can open into a crack with smooth, oxidised faces.',
    where: 'Thin walls far from the ingate, where flows from two directions meet.',
    ciatfGroup: 'C',
    synonyms: ['seam', 'line', 'crease', 'fold', 'join line', 'cold lap', 'crack'],
    source: describedIn(),
  },
  {
    id: 'laps',
    name: 'Laps and ripples',
    shortName: 'Laps',
    group: 'filling',
    recognise: 'Overlapping wavy folds or ripple lines, like tide marks, on an otherwise smooth top face.',
    where: 'Top faces of ingots and open-mould castings poured cold or slowly.',
    ciatfGroup: 'C',
    synonyms: ['ripples', 'wrinkle', 'wrinkles', 'waves', 'folds', 'lap lines', 'tide lines'],
    source: describedIn(),
  },
  {
    id: 'misrun',
    name: 'Misrun (short run)',
    shortName: 'Misrun',
    group: 'filling',
    recognise:
      'Part of the casting is missing and the metal ends in a smooth, rounded edge; a flat-topped gap means too little metal was poured instead.',
    where: 'Thin sections and the far end of the flow path.',
    ciatfGroup: 'E',
    synonyms: ['incomplete', 'short', 'unfilled', 'missing', 'not filled', 'short run', 'hole'],
    source: describedIn(),
  },
  {
    id: 'rounded_edges',
    name: 'Rounded corners and edges',
    shortName: 'Round edges',
    group: 'filling',
    recognise: 'Corners and edges that should be sharp come out radiused or soft, as if the metal stopped short of them.',
    where: 'Sharp corners and fine detail, typically aluminium in a cold metal mould.',
    ciatfGroup: 'E',
    synonyms: ['rounded corners', 'soft edges', 'blunt corners', 'not sharp', 'radiused', 'rounded'],
    source: describedIn(),
  },
  {
    id: 'oxide_inclusions',
    name: 'Oxide films (bifilms)',
    shortName: 'Oxide film',
    group: 'inclusion',
    recognise:
      'Thin grey or silvery wrinkled skins on a fracture, or fine linear marks and flakes on a machined face; folded oxide shows as wrinkles on ingot tops.',
    where: 'Anywhere the stream tumbled; often near the top and downstream of a turbulent ingate.',
    ciatfGroup: 'G',
    synonyms: ['oxide', 'skin', 'film', 'flakes', 'wrinkle', 'grey streaks', 'folds'],
    source: primary(`${PUBLICATIONS.raiszadehGriffiths2006}; ${PUBLICATIONS.campbell2003}`),
  },
  {
    id: 'dross_inclusions',
    name: 'Dross and slag inclusions',
    shortName: 'Dross',
    group: 'inclusion',
    recognise: 'Irregular dark-grey or black lumps and clusters, dull rather than metallic, in or on the casting.',
    where: 'Near the top surface, in corners and at the far end of the runner.',
    ciatfGroup: 'G',
    synonyms: ['dross', 'slag', 'dirt', 'black spots', 'specks', 'crud', 'junk'],
    source: describedIn(),
  },
  {
    id: 'sand_inclusions',
    name: 'Sand inclusions (cuts and washes)',
    shortName: 'Sand inclusion',
    group: 'inclusion',
    recognise:
      'Sharp sand grains or lumps embedded in the surface or inside; an eroded spot upstream leaves a matching lump of extra metal.',
    where: 'Near ingates and wherever the stream struck a sand face.',
    ciatfGroup: 'G',
    synonyms: ['sand', 'grit', 'sand holes', 'sand spots', 'grains', 'lumps', 'cut', 'wash'],
    source: describedIn(),
  },
  {
    id: 'hard_spots',
    name: 'Hard spots (chill, sludge, inverse chill)',
    shortName: 'Hard spot',
    group: 'inclusion',
    recognise:
      'Small areas that dull drills or skid files; on an iron fracture white or mottled zones, in aluminium bright hard specks of intermetallic sludge.',
    where: 'Thin edges and corners of iron castings (chill), the centre of thick iron sections (inverse chill), the bottom of aluminium melts held cool.',
    ciatfGroup: 'G',
    synonyms: ['hard spot', 'hard', 'chill', 'white iron', 'breaks drill', 'drill skids', 'sludge'],
    source: primary(`${PUBLICATIONS.giessereiLexikon}, "Inverse chill"`),
  },
  {
    id: 'rough_surface',
    name: 'Rough surface',
    shortName: 'Rough surface',
    group: 'surface',
    recognise: 'A coarse, sandy or orange-peel texture where the mould face should have been reproduced smoothly.',
    where: 'Large faces of sand castings; on metal-mould castings where the coating is thick or worn.',
    ciatfGroup: 'D',
    synonyms: ['rough', 'sandy', 'grainy', 'orange peel', 'textured', 'bumpy'],
    source: describedIn(),
  },
  {
    id: 'metal_penetration',
    name: 'Metal penetration (burn-on)',
    shortName: 'Penetration',
    group: 'surface',
    recognise: 'A rough crust of sand fused into the skin where metal ran between the grains; it will not brush off.',
    where: 'Hot spots, cores and the lower faces of heavy, hot castings (mostly iron and copper alloys).',
    ciatfGroup: 'D',
    synonyms: ['burn-on', 'burnt-in sand', 'crusty', 'rough crust', 'sand stuck', 'penetration'],
    source: describedIn(),
  },
  {
    id: 'scab',
    name: 'Scab (expansion defect)',
    shortName: 'Scab',
    group: 'surface',
    recognise: 'A raised, rough, flat plate of metal joined to the casting by a thin vein, with sand trapped beneath.',
    where: 'Large flat faces of sand castings, usually on the cope or drag face.',
    ciatfGroup: 'D',
    synonyms: ['scab', 'raised patch', 'blister', 'flake', 'plate'],
    source: primary(`${PUBLICATIONS.giessereiLexikon}, "Sand expansion defects"`),
  },
  {
    id: 'rat_tail',
    name: 'Rat tail',
    shortName: 'Rat tail',
    group: 'surface',
    recognise: 'A thin, shallow groove, often branching, running across an otherwise smooth face.',
    where: 'Usually the drag (bottom) face of sand castings.',
    ciatfGroup: 'D',
    synonyms: ['groove', 'line', 'scratch', 'rat tail', 'wavy line'],
    source: primary(`${PUBLICATIONS.giessereiLexikon}, "Rat tail"`),
  },
  {
    id: 'veining',
    name: 'Veining (finning)',
    shortName: 'Veining',
    group: 'surface',
    recognise: 'Thin fins of metal standing up from a surface, following a network of cracks.',
    where: 'Cored and internal surfaces of sand castings.',
    ciatfGroup: 'A',
    synonyms: ['fins', 'veins', 'web', 'whiskers', 'crack pattern'],
    source: secondary('Wikipedia, "Veining (metallurgy)", citing research on silica-sand cores'),
  },
  {
    id: 'exudation',
    name: 'Exudation (sweat beads)',
    shortName: 'Exudation',
    group: 'surface',
    recognise: 'Small beads or droplets of a differently coloured metal standing on the skin, e.g. tin sweat on bronze.',
    where: 'Surfaces of long-freezing-range alloys, often over heavy sections.',
    synonyms: ['sweat', 'beads', 'droplets', 'tin sweat', 'bumps'],
    source: commonPractice('inverse segregation of solute-rich liquid to the surface (from memory); no atlas letter assigned here'),
  },
  {
    id: 'hot_tear',
    name: 'Hot tear (hot crack)',
    shortName: 'Hot tear',
    group: 'crack',
    recognise: 'A jagged, ragged, branching crack with a dark or tinted oxidised fracture face.',
    where: 'Inside corners, junctions and changes of section where the mould or a core held back contraction.',
    ciatfGroup: 'C',
    synonyms: ['crack', 'tear', 'ragged crack', 'split', 'hot crack'],
    source: describedIn(),
  },
  {
    id: 'cold_crack',
    name: 'Cold crack',
    shortName: 'Cold crack',
    group: 'crack',
    recognise: 'A straight, clean, bright crack, often right through the section, with no oxide tint.',
    where: 'Between thick and thin sections, after a water quench, rough knock-out or a knock.',
    ciatfGroup: 'C',
    synonyms: ['crack', 'split', 'break', 'fracture', 'clean crack', 'quench crack'],
    source: describedIn(),
  },
  {
    id: 'flash',
    name: 'Flash (fins)',
    shortName: 'Flash',
    group: 'dimensional',
    recognise: 'Thin sheets of metal sticking out along the parting line or at core prints.',
    where: 'Parting line, core prints and worn mould joints.',
    ciatfGroup: 'A',
    synonyms: ['fin', 'fins', 'burr', 'webbing', 'parting line', 'thin edge'],
    source: describedIn(),
  },
  {
    id: 'warpage',
    name: 'Warpage (distortion)',
    shortName: 'Warp',
    group: 'dimensional',
    recognise: 'The casting is bent, bowed or twisted compared with the pattern; it rocks on a flat surface.',
    where: 'Long flat bars, plates and open frames.',
    ciatfGroup: 'F',
    synonyms: ['warp', 'bent', 'bowed', 'twisted', 'distorted', 'banana'],
    source: describedIn(),
  },
];

const DEFECT_KIND_INDEX: ReadonlyMap<string, DefectKind> = new Map(DEFECT_KINDS.map((k) => [k.id, k]));

/** The defect kind with this id; undefined for an unknown id. */
export function findDefectKind(id: string): DefectKind | undefined {
  return DEFECT_KIND_INDEX.get(id);
}

/** The group record for a group id. */
export function defectGroup(id: DefectGroupId): DefectGroup {
  return DEFECT_GROUPS.find((g) => g.id === id) as DefectGroup;
}
