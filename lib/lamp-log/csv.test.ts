import { describe, expect, it } from 'vitest';
import { parseReadingsCsv, parseTakenAt } from './csv';

const lamps = [
  { id: 7, label: 'Basking tube', firstUsedOn: '2025-01-01', baskingTransmission: 0.6 },
  { id: 8, label: 'Spot lamp', firstUsedOn: '2025-02-01', baskingTransmission: null },
];

describe('parseReadingsCsv', () => {
  it('reads every good row, in cm and inches, both units, with the usual spellings', () => {
    const csv = [
      'Lamp,Taken at,Distance,Distance unit,Value,Unit,Meter,Note',
      'Basking tube,2025-03-01,30,cm,41.5,uvb,broadband,',
      'basking tube,2025-03-01 10:15,12,in,"1,7",UV Index,index meter,same spot',
      '8,2025-03-02T09:00:00Z,25,cm,60,µW/cm²,,',
    ].join('\n');
    const r = parseReadingsCsv(csv, lamps);
    expect(r.errors).toEqual([]);
    expect(r.rows).toHaveLength(3);
    expect(r.rows[0]).toMatchObject({
      row: 2,
      lampId: 7,
      distanceCm: 30,
      value: 41.5,
      unit: 'uvb',
      meter: 'broadband',
    });
    expect(r.rows[0]!.takenAt).toBe('2025-03-01T12:00:00.000Z');
    expect(r.rows[1]).toMatchObject({
      row: 3,
      lampId: 7,
      distanceCm: 30.5,
      value: 1.7,
      unit: 'uvi',
      note: 'same spot',
    });
    expect(r.rows[2]).toMatchObject({ row: 4, lampId: 8, unit: 'uvb' });
  });

  it('names each bad row and field', () => {
    const csv = [
      'lamp,taken_at,distance,value,unit',
      'Basking tube,2025-03-01,30,41.5,uvb',
      'Basking tube,2025-13-01,30,41.5,uvb',
      'Nope,2025-03-01,30,41.5,uvb',
      'Basking tube,2025-03-01,thirty,41.5,uvb',
      'Basking tube,2025-03-01,30,-2,uvb',
      'Basking tube,2025-03-01,30,2,lux',
      'Spot lamp,2025-01-15,30,2,uvb',
      'Basking tube,2025-03-01,30',
    ].join('\n');
    const r = parseReadingsCsv(csv, lamps);
    expect(r.rows.map((x) => x.row)).toEqual([2]);
    expect(r.errors.map((e) => [e.row, e.field])).toEqual([
      [3, 'taken_at'],
      [4, 'lamp'],
      [5, 'distance'],
      [6, 'value'],
      [7, 'unit'],
      [8, 'taken_at'],
      [9, 'row'],
    ]);
    expect(r.errors[2]!.message).toBe('“thirty” is not a number.');
    expect(r.errors[5]!.message).toMatch(/first used on 2025-02-01/);
  });

  it('says which columns are missing, and lets the lamp column go when there is one lamp', () => {
    const r = parseReadingsCsv('taken_at,value\n2025-03-01,4', lamps);
    expect(r.errors).toEqual([expect.objectContaining({ row: 1, field: 'distance' })]);
    expect(r.errors[0]!.message).toMatch(/distance, unit, lamp/);
    const one = parseReadingsCsv('taken_at,distance_in,value,unit\n2025-03-01,10,40,uvb', lamps.slice(0, 1));
    expect(one.errors).toEqual([]);
    expect(one.rows[0]).toMatchObject({ lampId: 7, distanceCm: 25.4 });
  });

  it('reads how each reading was taken, and leaves it "not recorded" when the columns are missing or empty', () => {
    const csv = [
      'lamp,taken_at,distance,value,unit,through,through_transmission,warmed_up',
      'Basking tube,2025-03-01,30,25,uvb,lid,,yes',
      'Basking tube,2025-03-02,30,25,uvb,screen,"0,5",no',
      'Basking tube,2025-03-03,30,25,uvb,,,',
      'Basking tube,2025-03-04,30,25,uvb,glass,,',
      'Basking tube,2025-03-05,30,25,uvb,bare,,Yes',
    ].join('\n');
    const r = parseReadingsCsv(csv, lamps);
    expect(r.errors).toEqual([]);
    expect(r.rows.map((x) => [x.through, x.throughTransmission, x.warmedUp])).toEqual([
      // The lid's share is the lamp's own setting when the row leaves it empty.
      ['lid', 0.6, 'yes'],
      ['screen', 0.5, 'no'],
      ['not-recorded', null, 'not-recorded'],
      ['glass', null, 'not-recorded'],
      ['nothing', null, 'yes'],
    ]);
    const old = parseReadingsCsv('lamp,taken_at,distance,value,unit\nSpot lamp,2025-03-01,30,25,uvb', lamps);
    expect(old.rows[0]).toMatchObject({
      through: 'not-recorded',
      throughTransmission: null,
      warmedUp: 'not-recorded',
    });
  });

  it('names the set-up column of a bad row', () => {
    const csv = [
      'lamp,taken_at,distance,value,unit,through,through_transmission,warmed_up',
      'Basking tube,2025-03-01,30,25,uvb,window,,',
      'Basking tube,2025-03-01,30,25,uvb,screen,,',
      'Spot lamp,2025-03-01,30,25,uvb,lid,,',
      'Basking tube,2025-03-01,30,25,uvb,lid,1.4,',
      'Basking tube,2025-03-01,30,25,uvb,lid,,maybe',
    ].join('\n');
    const r = parseReadingsCsv(csv, lamps);
    expect(r.rows).toEqual([]);
    expect(r.errors.map((e) => [e.row, e.field])).toEqual([
      [2, 'through'],
      [3, 'through_transmission'],
      [4, 'through_transmission'],
      [5, 'through_transmission'],
      [6, 'warmed_up'],
    ]);
    expect(r.errors[2]!.message).toMatch(/no lid set/);
  });

  it('reports a file with a header only', () => {
    expect(parseReadingsCsv('lamp,taken_at,distance,value,unit\n', lamps).errors[0]!.message).toMatch(
      /no readings/,
    );
  });
});

describe('parseTakenAt', () => {
  it('reads local times in the uploader’s time zone and dates at noon', () => {
    // getTimezoneOffset() is −60 in UTC+1: 10:00 local is 09:00 UTC.
    expect(parseTakenAt('2025-03-01 10:00', -60)!.toISOString()).toBe('2025-03-01T09:00:00.000Z');
    expect(parseTakenAt('2025-03-01', -600)!.toISOString()).toBe('2025-03-01T12:00:00.000Z');
    expect(parseTakenAt('2025-02-29', 0)).toBeNull();
    expect(parseTakenAt('01/03/2025', 0)).toBeNull();
  });
});
