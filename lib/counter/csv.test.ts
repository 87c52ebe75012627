import { describe, expect, it } from 'vitest';
import { parseCounterCsv } from './csv';

const types = [
  { id: 3, name: 'T5 tube 12%' },
  { id: 4, name: 'Mercury vapour 100 W' },
];
const HEADER = 'Customer,Lamp type,First use,Date,Distance,Distance unit,Value,Unit,Meter';

describe('parseCounterCsv', () => {
  it('reads past tests with the readings import’s spellings; an empty customer is a walk-in', () => {
    const csv = [
      HEADER,
      'Alex Example,t5 tube 12%,2025-01-10,2025-03-01,30,cm,41.5,uvb,broadband',
      'Alex Example,T5 tube 12%,2025-01-10,2025-06-01 10:15,12,in,"1,7",UV Index,',
      ',4,2025-02-01,2025-04-02,30,,60,µW/cm²,',
    ].join('\n');
    const r = parseCounterCsv(csv, types, 0, '2026-01-01');
    expect(r.errors).toEqual([]);
    expect(r.rows).toHaveLength(3);
    expect(r.rows[0]).toMatchObject({
      row: 2,
      customerName: 'Alex Example',
      lampTypeId: 3,
      firstUsedOn: '2025-01-10',
      distanceCm: 30,
      value: 41.5,
      unit: 'uvb',
      meter: 'broadband',
      through: 'not-recorded',
    });
    expect(r.rows[1]).toMatchObject({ row: 3, distanceCm: 30.5, value: 1.7, unit: 'uvi' });
    expect(r.rows[2]).toMatchObject({ row: 4, customerName: null, lampTypeId: 4 });
  });

  it('names the line and the column of every problem', () => {
    const csv = [
      HEADER,
      'Alex Example,Unknown lamp,2025-01-10,2025-03-01,30,cm,41.5,uvb,',
      'Alex Example,T5 tube 12%,2025-13-10,2025-03-01,30,cm,41.5,uvb,',
      'Alex Example,T5 tube 12%,2025-01-10,yesterday,30,cm,41.5,uvb,',
      'Alex Example,T5 tube 12%,2025-01-10,2025-03-01,30,cm,lots,uvb,',
      'Alex Example,T5 tube 12%,2025-01-10,2025-03-01,30,cm,41.5,lumens,',
      'Alex Example,T5 tube 12%,2025-04-10,2025-03-01,30,cm,41.5,uvb,',
      `${'x'.repeat(121)},T5 tube 12%,2025-01-10,2025-03-01,30,cm,41.5,uvb,`,
      'Alex Example,T5 tube 12%,2025-01-10,2025-03-01,30,furlongs,41.5,uvb,',
    ].join('\n');
    const r = parseCounterCsv(csv, types, 0, '2026-01-01');
    expect(r.rows).toEqual([]);
    expect(r.errors.map((e) => [e.row, e.field])).toEqual([
      [2, 'lamp_type'],
      [3, 'first_use'],
      [4, 'date'],
      [5, 'value'],
      [6, 'unit'],
      [7, 'date'],
      [8, 'customer'],
      [9, 'distance_unit'],
    ]);
    expect(r.errors[0]!.message).toContain('Unknown lamp');
    expect(r.errors[3]!.message).toBe('“lots” is not a number.');
    expect(r.errors[5]!.message).toMatch(/first switched on 2025-04-10/);
  });

  it('refuses a header without the columns it needs, naming them', () => {
    const r = parseCounterCsv('customer,date,value\nA,2025-03-01,3', types);
    expect(r.rows).toEqual([]);
    expect(r.errors).toHaveLength(1);
    expect(r.errors[0]).toMatchObject({ row: 1, field: 'lamp_type' });
    expect(r.errors[0]!.message).toMatch(/lamp_type, first_use, distance, unit/);
  });

  it('refuses a first use in the future and a lid without its share', () => {
    const csv = [
      'customer,lamp_type,first_use,date,distance,value,unit,through',
      'A,3,2027-01-01,2025-03-01,30,40,uvb,',
      'A,3,2025-01-01,2025-03-01,30,40,uvb,lid',
    ].join('\n');
    const r = parseCounterCsv(csv, types, 0, '2026-01-01');
    expect(r.errors.map((e) => [e.row, e.field])).toEqual([
      [2, 'first_use'],
      [3, 'through_transmission'],
    ]);
  });
});
