import { z } from 'zod';

/**
 * How far a stored value can be trusted:
 * - `primary`: read in the named handbook, standard, paper or a faithful reproduction;
 * - `secondary`: read in a data aggregator, supplier sheet or trade article repeating it;
 * - `memory`: recalled from the named literature but not re-read; the citation says "from memory";
 * - `practice`: a fact of the trade with no single publication ("common practice");
 * - `heuristic`: a threshold chosen by this app to rank causes, not a published value.
 */
export const SOURCE_GRADES = ['primary', 'secondary', 'memory', 'practice', 'heuristic'] as const;
export type SourceGrade = (typeof SOURCE_GRADES)[number];

export const sourceNoteSchema = z.object({
  citation: z.string().min(3).max(400),
  grade: z.enum(SOURCE_GRADES),
});

/** A citation with its trust grade, stored beside every value of the trade core. */
export type SourceNote = z.infer<typeof sourceNoteSchema>;

/** Builds a primary citation. */
export function primary(citation: string): SourceNote {
  return { citation, grade: 'primary' };
}

/** Builds a secondary citation; the text says so, so it survives being shown alone. */
export function secondary(citation: string): SourceNote {
  return { citation: `${citation} (secondary source)`, grade: 'secondary' };
}

/** Builds a from-memory citation; the text says "from memory" so nobody mistakes it for a checked value. */
export function fromMemory(citation: string): SourceNote {
  return { citation: `${citation} — from memory, not re-checked`, grade: 'memory' };
}

/** A fact of the trade with no single publication behind it. */
export function commonPractice(detail: string): SourceNote {
  return { citation: `common practice: ${detail}`, grade: 'practice' };
}

/** A threshold this app chose for ranking; never presented as a published value. */
export function appHeuristic(detail: string): SourceNote {
  return { citation: `app heuristic, not a published threshold: ${detail}`, grade: 'heuristic' };
}

/**
 * Publications cited in more than one module, spelled once so the same work is
 * never cited two ways.
 */
export const PUBLICATIONS = {
  asmVol2: 'ASM Handbook Vol. 2, Properties and Selection: Nonferrous Alloys and Special-Purpose Materials (ASM International, 1990)',
  asmVol15Defects: 'ASM Handbook Vol. 15, Casting (ASM International, 2008), article "Common Defects in Various Casting Processes"',
  campbell2003: 'J. Campbell, Castings, 2nd ed. (Butterworth-Heinemann, 2003)',
  ransleyNeufeld1948: 'C. E. Ransley and H. Neufeld, J. Inst. Metals 74 (1948) 559',
  talbotAnyalebechi1988: 'D. E. J. Talbot and P. N. Anyalebechi, Mater. Sci. Technol. 4(1) (1988) 1–4, recommended equation',
  anyalebechiReview: 'P. N. Anyalebechi, critical review of hydrogen solubility in aluminium (abstract)',
  alduchovEskridge1996: 'O. A. Alduchov and R. E. Eskridge, J. Appl. Meteorol. 35 (1996) 601–609',
  zadehCampbell2004: 'Zadeh and Campbell, Int. J. Cast Metals Res. (2004), fluidity of Al-Si and grey iron (abstract)',
  raiszadehGriffiths2006: 'Raiszadeh and Griffiths (2006) and Najafzadeh-Bakhtiarani and Raiszadeh, Met. Trans. B (2011), on bifilms in liquid aluminium',
  hseMoltenMetal: 'UK HSE, "Safety topics in the molten metal industries" and HSE molten-metal explosion safety alert',
  saltFluxReview2023: 'Metals 13 (2023) 832, review "Solid salt fluxes for molten aluminum processing" (abstract)',
  fluxSupplierNote: 'aluminium flux supplier technical note on sodium-free fluxes for high-Mg alloys',
  aaCastability: 'Aluminum Association castability ratings as reproduced in foundry alloy characteristic tables',
  asmVol2B295: 'ASM Handbook Vol. 2B (2019), 295.0 alloy data sheet',
  giessereiLexikon: 'Giesserei-Lexikon (online foundry encyclopaedia)',
  gate2018: 'GATE 2018 Mechanical Engineering, published question and solution on riser design',
  dooley: 'W. H. Dooley, Applied Science for Metal Workers',
  shopPractice2: 'Shop Practice vol. 2, section on shrinkage rules',
  astmB917: 'ASTM B917/B917M, heat treatment of aluminium-alloy castings, as quoted in a published research paper',
  foundryDesignGuide: 'foundry casting design guide on heat treatment of aluminium castings',
  ams2771: 'SAE AMS 2771, heat treatment of aluminium-alloy castings (aerospace)',
  wlodawer1966: 'R. Wlodawer, Directional Solidification of Steel Castings (Pergamon, 1966)',
  its90: 'International Temperature Scale of 1990, H. Preston-Thomas, Metrologia 27 (1990) 3–10, defining fixed points',
  nistSp811: 'NIST Special Publication 811 (2008), Guide for the Use of the International System of Units, Appendix B',
  ndalimanPius2004: 'Ndaliman and Pius, Federal University of Technology Minna (2004), pouring temperature and sand-cast aluminium surface finish, as summarised online',
  meighAlBronze: 'H. Meigh, chapter "Manufacture and design of aluminium bronze castings" (abstract)',
  fmtCrucible: 'Foundry Management & Technology, "Top 10 ways to maximize crucible service life"',
  cdaCopperCasting: 'Copper Development Association, Copper Casting Alloys data tables',
  tableA3: 'non-ferrous foundry handbook, Table A.3 "Principal alloy designations, cast products" (BS/EN/ANSI alloys with liquidus and solidus)',
} as const;
