import { describe, expect, test } from 'vitest';
import { ZodError } from 'zod';
import { findAlloy } from '../domain/index.ts';
import { workshopAlloyCreateSchema, workshopAlloyUpdateSchema } from './alloy-schemas.ts';
import { composeWorkshopAlloy, updateWorkshopAlloy } from './workshop-alloy.ts';

const a356 = findAlloy('A356.0')!;

describe('composeWorkshopAlloy', () => {
  test('when a workshop alloy is based on A356.0, then it carries A356.0’s values and citations and its own note', () => {
    const input = workshopAlloyCreateSchema.parse({
      designation: 'Wheel scrap',
      basedOn: 'a356',
      source: 'Cast alloy wheels, assumed A356 (most are)',
    });

    const alloy = composeWorkshopAlloy(input);

    expect(alloy).toMatchObject({
      designation: 'Wheel scrap',
      commonName: 'Wheel scrap (assumed A356.0)',
      basedOn: 'A356.0',
      solidusC: a356.solidusC,
      liquidusC: a356.liquidusC,
      pourRangeC: a356.pourRangeC,
      densityGcm3: a356.densityGcm3,
      source: 'Cast alloy wheels, assumed A356 (most are)',
    });
    expect(alloy.sources.solidusLiquidus).toEqual(a356.sources.solidusLiquidus);
    expect(alloy.aliases).toEqual([]);
  });

  test('when the workshop overrides the liquidus of its base, then the base’s thermal citation is dropped and the rest kept', () => {
    const input = workshopAlloyCreateSchema.parse({
      designation: 'Piston scrap',
      basedOn: 'A356.0',
      liquidusC: 620,
      pourRangeC: { permanentMould: null },
      source: 'Our own cooling-curve test, Nov 2026',
    });

    const alloy = composeWorkshopAlloy(input);

    expect(alloy.liquidusC).toBe(620);
    expect(alloy.sources.solidusLiquidus).toBeUndefined();
    expect(alloy.sources.pourRange).toBeUndefined();
    expect(alloy.pourRangeC).toEqual({ sand: a356.pourRangeC.sand });
    expect(alloy.sources.density).toEqual(a356.sources.density);
  });

  test('when an alloy without a base lacks its thermal values, then the schema names each missing field', () => {
    const result = workshopAlloyCreateSchema.safeParse({ designation: 'Mystery bar', source: 'found in the scrap bin' });

    expect(result.success).toBe(false);
    expect(result.error?.issues.map((i) => i.path.join('.')).sort()).toEqual(['densityGcm3', 'family', 'liquidusC', 'solidusC']);
  });

  test('when the solidus is above the liquidus, then composing throws a ZodError on solidusC', () => {
    const input = workshopAlloyCreateSchema.parse({
      designation: 'Backwards',
      family: 'aluminium',
      solidusC: 640,
      liquidusC: 600,
      densityGcm3: 2.7,
      source: 'typed in wrong on purpose',
    });

    expect(() => composeWorkshopAlloy(input)).toThrow(ZodError);
    try {
      composeWorkshopAlloy(input);
    } catch (error) {
      expect((error as ZodError).issues.map((i) => i.path.join('.'))).toContain('solidusC');
    }
  });
});

describe('updateWorkshopAlloy', () => {
  test('when the pattern allowance is cleared and the name changed, then only those change', () => {
    const current = composeWorkshopAlloy(
      workshopAlloyCreateSchema.parse({ designation: 'Wheel scrap', basedOn: 'A356.0', source: 'wheels' }),
    );

    const next = updateWorkshopAlloy(current, workshopAlloyUpdateSchema.parse({ designation: 'Wheel scrap 2', patternShrinkPct: null }));

    expect(next.designation).toBe('Wheel scrap 2');
    expect(next.patternShrinkPct).toBeUndefined();
    expect(next.sources.patternShrink).toBeUndefined();
    expect(next.liquidusC).toBe(a356.liquidusC);
    expect(next.source).toBe('wheels');
  });
});
