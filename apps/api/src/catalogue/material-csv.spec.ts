import { BadRequestException } from '@nestjs/common';
import { describeBadRows, parseCsv, toCsv, unescapeCell } from './csv';
import { checkMaterialRows, formatPacks, MATERIAL_CSV_COLUMNS, MATERIAL_CSV_REQUIRED, materialCsvRow, parsePacks } from './material-csv';
import { MATERIAL_DEFAULTS, MaterialFields, materialRuleErrors } from './material-fields';

const parse = (csv: string) => parseCsv(csv, MATERIAL_CSV_COLUMNS, MATERIAL_CSV_REQUIRED);
const check = (csv: string, existing = new Map<string, { id: string; fields: MaterialFields }>()) => checkMaterialRows(parse(csv), existing);

/** A 25 kg drum of base resin; packs are common trade practice, no source (TRADE.md [practice]). */
const RESIN: MaterialFields = {
  ...MATERIAL_DEFAULTS,
  code: 'RES-25',
  name: 'Base resin',
  kind: 'base-resin',
  stockUnit: 'kg',
  packSizes: [{ size: '25', label: '25 kg drum' }],
  hazardClass: '3',
  unNumber: '1866', // resin solution, class 3 [pub] dangerous-goods list (TRADE.md)
  shelfLifeDays: 180,
};

const HEAD = 'code,name,kind,stock_unit,pack_sizes';

describe('parseCsv', () => {
  it('reads the header in any case and order, strips a byte-order mark, trims cells and numbers rows as a spreadsheet does', () => {
    const t = parse('\uFEFFName,CODE,kind,stock_unit,pack_sizes\r\n  Resin ,RES-1,base-resin,kg,25:25 kg drum\r\n,,,,\r\nMat,MAT-1,mat,m2,64:roll\n');
    expect(t.columns).toEqual(['name', 'code', 'kind', 'stock_unit', 'pack_sizes']);
    expect(t.records.map((r) => r.row)).toEqual([2, 4]);
    expect(t.records[0]!.cells.get('name')).toBe('Resin');
    expect(t.records[0]!.problem).toBeNull();
  });

  it.each([
    ['', /empty/],
    ['   \r\n', /empty/],
    ['code,name,colour\r\n', /"colour" is not one of/],
    ['code,name,kind,stock_unit\r\n', /lacks the column pack_sizes/],
    ['code,name\r\n', /lacks the columns kind, stock_unit, pack_sizes/],
    ['code,CODE,name,kind,stock_unit,pack_sizes\r\n', /column code appears twice/],
    ['code;name;kind;stock_unit;pack_sizes\r\n', /is not one of/],
  ])('refuses the file %j with a 400 naming csv', (csv, message) => {
    expect(() => parse(csv)).toThrow(BadRequestException);
    try {
      parse(csv);
    } catch (e) {
      const body = (e as BadRequestException).getResponse() as { message: string; code: string };
      expect(body.code).toBe('validation_failed');
      expect(body.message).toMatch(/^csv: /);
      expect(body.message).toMatch(message);
    }
  });

  it('keeps the shape problems of a row on the row', () => {
    const t = parse(`${HEAD}\r\nA,B,other,each\r\nC,D,other,each,1:x,extra\r\n"E,F,other,each,1:x\r\n`);
    expect(t.records.map((r) => r.problem)).toEqual([
      'the row has 4 cells but the first row names 5 columns',
      'the row has 6 cells but the first row names 5 columns',
      'a quoted cell is not closed',
    ]);
  });

  it('refuses more rows than one import takes', () => {
    const csv = `${HEAD}\n${'A,B,other,each,1:x\n'.repeat(20_001)}`;
    expect(() => parse(csv)).toThrow(/split it into files of at most 20000/);
  });
});

describe('toCsv and unescapeCell', () => {
  it('escapes cells a spreadsheet would run as a formula, but not negative numbers, and parses them back unchanged', () => {
    const values = ['=1+1', '+A', '@SUM', '-x', '-', '-20', '-0.5', 'plain', 'a,b', 'say "hi"', ' padded '];
    const csv = toCsv(['v'], values.map((v) => ({ v })));
    expect(csv.startsWith('\uFEFFv\r\n')).toBe(true);
    expect(csv).toContain(`"'=1+1"`);
    expect(csv).toContain('\r\n-20\r\n');
    expect(csv).toContain('\r\n-0.5\r\n');
    const back = parseCsv(csv, ['v'], ['v']).records.map((r) => r.cells.get('v'));
    expect(back).toEqual(values.map((v) => v.trim()));
  });

  it.each([
    ["'=A1", '=A1'],
    ["'-x", '-x'],
    ["'plain", "'plain"],
    ['plain', 'plain'],
  ])('unescapeCell(%j) = %j', (cell, expected) => {
    expect(unescapeCell(cell)).toBe(expected);
  });
});

describe('pack lists', () => {
  it.each([
    ['20:20 kg drum; 25:25 kg drum', [{ size: '20', label: '20 kg drum' }, { size: '25', label: '25 kg drum' }]],
    ['1:each', [{ size: '1', label: 'each' }]],
    ['30: 30 m roll: bandage ;', [{ size: '30', label: '30 m roll: bandage' }]],
    ['25 kg drum', null],
    [':label', null],
  ])('parsePacks(%j)', (cell, expected) => {
    expect(parsePacks(cell)).toEqual(expected);
  });

  it('formatPacks writes what parsePacks reads', () => {
    const packs = [{ size: '0.5', label: '500 g bottle' }, { size: '5', label: '5 kg' }];
    expect(parsePacks(formatPacks(packs))).toEqual(packs);
  });
});

describe('checkMaterialRows', () => {
  it('creates a new code, with defaults for the columns left out', () => {
    const [r] = check(`${HEAD}\nBAT-1,Batten,batten,m,4.8:4.8 m length`);
    expect(r).toMatchObject({ row: 2, action: 'create', code: 'BAT-1', name: 'Batten', errors: [], existingId: null });
    expect(r!.fields).toMatchObject({ lotTracked: true, hazardClass: 'none', reorderLevel: '0', active: true, shelfLifeDays: null });
  });

  it('updates a known code (any case), keeps columns left out, and says unchanged when nothing differs', () => {
    const existing = new Map([['res-25', { id: 'm1', fields: RESIN }]]);
    const [same, renamed] = check(`${HEAD}\nres-25,Base resin,base-resin,kg,25:25 kg drum\nRES-25,Resin GP,base-resin,kg,25.000:25 kg drum`, existing);
    expect(same).toMatchObject({ action: 'update', existingId: 'm1', errors: [] }); // the code's case changes
    expect(same!.fields).toMatchObject({ code: 'res-25', shelfLifeDays: 180, unNumber: '1866' });
    expect(renamed!.errors).toEqual([{ field: 'code', message: 'the code RES-25 is also on row 2; each material once per file' }]);
    const [unchanged] = check(`${HEAD}\nRES-25,Base resin,base-resin,kg,25.000:25 kg drum`, existing);
    expect(unchanged!.action).toBe('unchanged');
  });

  it('an empty cell clears an optional field and keeps a field that must have a value', () => {
    const existing = new Map([['res-25', { id: 'm1', fields: { ...RESIN, reorderLevel: '40' } }]]);
    const [r] = check(`${HEAD},shelf_life_days,reorder_level,lot_tracked\nRES-25,Base resin,base-resin,kg,25:drum,,,`, existing);
    expect(r!.fields).toMatchObject({ shelfLifeDays: null, reorderLevel: '40', lotTracked: true });
  });

  it.each([
    ['a required cell left empty', `${HEAD}\n,Resin,base-resin,kg,25:drum`, 'code', 'must not be empty'],
    ['an unknown kind', `${HEAD}\nX-1,Resin,resin,kg,25:drum`, 'kind', 'must be one of mat, bandage'],
    ['an unknown stock unit', `${HEAD}\nX-1,Resin,base-resin,tonne,25:drum`, 'stock_unit', 'must be one of kg'],
    ['a pack list without labels', `${HEAD}\nX-1,Resin,base-resin,kg,25`, 'pack_sizes', 'size:label'],
    ['a pack of size 0', `${HEAD}\nX-1,Resin,base-resin,kg,0:none`, 'pack_sizes', 'pack 1 size: must be greater than 0'],
    ['a word for a whole number', `${HEAD},shelf_life_days\nX-1,Resin,base-resin,kg,25:drum,six months`, 'shelf_life_days', 'whole number of days'],
    ['a fraction of a day', `${HEAD},shelf_life_days\nX-1,Resin,base-resin,kg,25:drum,1.5`, 'shelf_life_days', 'whole number of days'],
    ['a yes/no cell with another word', `${HEAD},lot_tracked\nX-1,Resin,base-resin,kg,25:drum,sometimes`, 'lot_tracked', 'yes or no'],
    ['a temperature with two decimals', `${HEAD},storage_min_c\nX-1,Resin,base-resin,kg,25:drum,5.25`, 'storage_min_c', 'at most 1 decimal place'],
    ['a mat without its weight', `${HEAD},roll_width_m\nM-1,Mat,mat,m2,64:roll,1.04`, 'mat_gsm', 'a mat needs its weight'],
    ['a trim without its kind', `${HEAD},trim_length_m\nT-1,Trim,trim,each,1:3 m length,3`, 'trim_kind', 'a trim needs its kind'],
    ['a hazardous material without a UN number', `${HEAD},hazard_class\nA-1,Acetone,acetone,L,5:can,3`, 'un_number', 'needs its UN number'],
    ['a UN number written UN1090', `${HEAD},hazard_class,un_number\nA-1,Acetone,acetone,L,5:can,3,UN1090`, 'un_number', 'four digits'],
    ['storage min above max', `${HEAD},storage_min_c,storage_max_c\nX-1,Resin,other,kg,25:drum,30,5`, 'storage_max_c', 'must not be below the storage minimum (30 °C)'],
  ])('%s is a row error naming the column', (_what, csv, field, message) => {
    const [r] = check(csv);
    expect(r!.fields).toBeNull();
    expect(r!.errors).toEqual([{ field, message: expect.stringContaining(message) }]);
  });

  it('notes a change of stock unit for the service to check against use', () => {
    const existing = new Map([['res-25', { id: 'm1', fields: RESIN }]]);
    const [r] = check(`${HEAD}\nRES-25,Base resin,base-resin,L,25:drum`, existing);
    expect(r!.stockUnitChangedFrom).toBe('kg');
  });

  it('an export row of a material reads back as the same fields', () => {
    const acetone: MaterialFields = {
      ...RESIN,
      code: 'ACE-5',
      kind: 'acetone',
      stockUnit: 'L',
      packSizes: [{ size: '5', label: '5 L can' }],
      unNumber: '1090', // acetone UN1090, class 3, PG II [pub] ILO ICSC 0087
      packingGroup: 'II',
      flashPointC: '-20', // about −20 °C [pub] ILO ICSC 0087
      storageMinC: '-5',
      notes: '=not a formula',
      active: false,
    };
    const csv = toCsv(MATERIAL_CSV_COLUMNS, [materialCsvRow(acetone)]);
    const [r] = check(csv, new Map([['ace-5', { id: 'a', fields: acetone }]]));
    expect(r).toMatchObject({ action: 'unchanged', errors: [] });
    expect(r!.fields).toEqual(acetone);
  });
});

describe('materialRuleErrors', () => {
  const ok = (over: Partial<MaterialFields>) => materialRuleErrors({ ...RESIN, ...over }).map((e) => e.field);
  it.each([
    [{ kind: 'mat', matGsm: 450, rollWidthM: '1.04', hazardClass: 'none', unNumber: null } as const, []],
    [{ kind: 'bandage', matGsm: 450, rollWidthM: '0.1', hazardClass: 'none', unNumber: null } as const, []],
    [{ kind: 'bandage', hazardClass: 'none', unNumber: null } as const, []],
    [{ kind: 'mat', hazardClass: 'none', unNumber: null } as const, ['matGsm', 'rollWidthM']],
    [{ kind: 'trim', hazardClass: 'none', unNumber: null } as const, ['trimKind', 'trimLengthM']],
    [{ kind: 'trim', trimKind: 'kerb', trimLengthM: '3', hazardClass: 'none', unNumber: null } as const, []],
    [{ trimKind: 'drip', trimLengthM: '3' } as const, ['trimKind', 'trimLengthM']],
    [{ topcoatColour: 'grey' }, ['topcoatColour']],
    [{ kind: 'topcoat', topcoatColour: 'grey' } as const, []],
    [{ hazardClass: 'none' } as const, ['unNumber']],
    [{ hazardClass: 'none', unNumber: null, packingGroup: 'II' } as const, ['packingGroup']],
    [{ unNumber: null }, ['unNumber']],
    // Organic peroxides and gases have no packing group: [memory] ADR 2.1.1.3, verify.
    [{ kind: 'catalyst', hazardClass: '5.2', unNumber: '3105', packingGroup: 'II' } as const, ['packingGroup']],
    [{ kind: 'catalyst', hazardClass: '5.2', unNumber: '3105' } as const, []],
    [{ packingGroup: 'III' } as const, []],
    [{ storageMinC: '5', storageMaxC: '5' }, []],
    [{ storageMinC: '5.1', storageMaxC: '5' }, ['storageMaxC']],
    [{ packSizes: [{ size: '25', label: 'a' }, { size: '25.00', label: 'b' }] }, ['packSizes']],
  ])('%j → %j', (over, fields) => {
    expect(ok(over)).toEqual(fields);
  });
});

describe('describeBadRows', () => {
  it('names each bad row and its reasons, then how many more', () => {
    const rows = Array.from({ length: 25 }, (_, i) => ({ row: i + 2, errors: i === 0 ? [] : [{ field: 'kind', message: 'bad' }] }));
    const text = describeBadRows(rows, 2);
    expect(text).toBe('Row 3: kind: bad. Row 4: kind: bad. And 22 more rows.');
  });
});
