import { CsvShapeError, parseLoggerCsv, parseTemperature, parseTimestamp } from './logger-csv';

const NOW = new Date('2025-07-01T12:00:00Z');

describe('parseTimestamp', () => {
  it.each([
    ['2025-06-01T06:00:00Z', '2025-06-01T06:00:00.000Z'],
    ['2025-06-01T07:00:00+01:00', '2025-06-01T06:00:00.000Z'],
    // no zone: UK local time; British Summer Time is UTC+1 in June, GMT (UTC) in January [pub] UK Summer Time Act 1972 as amended
    ['2025-06-01 07:00', '2025-06-01T06:00:00.000Z'],
    ['2025-01-10 07:00:30', '2025-01-10T07:00:30.000Z'],
    ['01/06/2025 07:00', '2025-06-01T06:00:00.000Z'],
  ])('%s is %s', (raw, iso) => {
    expect(parseTimestamp(raw)?.toISOString()).toBe(iso);
  });

  it.each(['2025-02-30 10:00', '31/13/2025 10:00', 'yesterday', '2025-06-01', ''])('refuses %j', (raw) => {
    expect(parseTimestamp(raw)).toBeNull();
  });
});

describe('parseTemperature', () => {
  it.each([
    ['21.456', false, '21.46'],
    ['-3', false, '-3.00'],
    ['18.5 °C', false, '18.50'],
    ['21,5', true, '21.50'],
    ['21,5', false, null],
    ['warm', false, null],
  ])('%s (comma decimal %s) is %s', (raw, comma, out) => {
    expect(parseTemperature(raw, comma)).toBe(out);
  });
});

describe('parseLoggerCsv', () => {
  it('keeps the good rows and lists each bad one with its line in the file', () => {
    const csv = [
      'Timestamp,Temperature',
      '2025-06-01T06:00:00Z,17.8',
      '2025-06-01T07:00:00Z,hot',
      '',
      'not a time,18',
      '2025-06-01T08:00:00Z,140',
      '2030-01-01T00:00:00Z,18',
      '2025-06-01T09:00:00Z,19.25',
    ].join('\n');
    const out = parseLoggerCsv(csv, NOW);
    expect(out.rows).toBe(6);
    expect(out.readings.map((r) => [r.row, r.temperatureC])).toEqual([
      [2, '17.80'],
      [8, '19.25'],
    ]);
    expect(out.errors.map((e) => e.row)).toEqual([3, 5, 6, 7]);
    expect(out.errors[0]!.message).toMatch(/temperature "hot" is not a number/);
    expect(out.errors[1]!.message).toMatch(/timestamp "not a time" is not a date and time/);
    expect(out.errors[2]!.message).toMatch(/140.00 °C is not a storage temperature/);
    expect(out.errors[3]!.message).toMatch(/in the future/);
  });

  it('reads semicolon files with comma decimals and other column names', () => {
    const out = parseLoggerCsv('\uFEFFDate/Time;Temp (°C)\n01/06/2025 07:00;21,5\n', NOW);
    expect(out.readings).toEqual([{ row: 2, takenAt: new Date('2025-06-01T06:00:00Z'), temperatureC: '21.50' }]);
  });

  it('refuses a file without the two columns, naming what it found', () => {
    expect(() => parseLoggerCsv('when,reading\n1,2\n', NOW)).toThrow(CsvShapeError);
    expect(() => parseLoggerCsv('when,reading\n1,2\n', NOW)).toThrow(/found: when, reading/);
  });
});

describe('logger headings', () => {
  // Logger exports spell the same heading many ways; common trade practice, no source.
  it.each(['Temp °C', 'temp (°C)', 'TEMP_°C', 'Temperature (C)', ' temperature '])('reads "%s" as the temperature column', (heading) => {
    const out = parseLoggerCsv(`Timestamp,${heading}\n2025-06-01T07:00:00Z,21.5\n`, NOW);
    expect(out.readings.map((r) => r.temperatureC)).toEqual(['21.50']);
  });
});
