import { describe, expect, test } from 'vitest';
import { autoMapping, effectiveMapping, headerOf } from './csv-mapping.ts';

describe('autoMapping', () => {
  test('when their headers are our column names in other spellings, then each is matched by name', () => {
    expect(autoMapping(['Poured at', 'ALLOY', 'Charge-Lines', 'Pour temp (C)', 'Notes'])).toEqual({
      poured_at: 'Poured at',
      alloy: 'ALLOY',
      charge_lines: 'Charge-Lines',
      pour_temp_c: 'Pour temp (C)',
      notes: 'Notes',
    });
  });

  test('when a header is a common other name, then it is matched too, but never twice', () => {
    expect(autoMapping(['Date', 'Metal', 'Pour', 'Humidity'])).toEqual({
      poured_at: 'Date',
      alloy: 'Metal',
      pour_temp_c: 'Pour',
      relative_humidity_pct: 'Humidity',
    });
  });
});

describe('effectiveMapping', () => {
  test('when the caster picks a column or "not imported", then that wins over the automatic match', () => {
    const auto = { poured_at: 'Date', notes: 'Notes' };
    expect(effectiveMapping(auto, { poured_at: 'When', notes: '' })).toEqual({ poured_at: 'When' });
  });
});

describe('headerOf', () => {
  test('when the text is CSV, then its header and row count come back', () => {
    expect(headerOf('a,b\r\n1,2\r\n3,4\r\n')).toEqual({ headers: ['a', 'b'], rows: 2, error: null });
  });
  test('when a quoted field never closes, then the message says where', () => {
    expect(headerOf('a,b\n"1,2\n').error).toMatch(/Row 2: a quoted field is never closed/);
  });
});
