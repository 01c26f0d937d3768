import { describe, expect, it } from 'vitest';
import { formatCount, formatDate, formatDateTime, formatFixed, formatMoney, formatNumber, plural, poLabel } from './format';
import { formatQuantity } from './thermal/units';

describe('numbers', () => {
  it('groups thousands and keeps a few significant digits', () => {
    expect(formatNumber(171_123)).toBe('171,000');
    expect(formatNumber(171_123, 4)).toBe('171,100');
    expect(formatNumber(0.93149)).toBe('0.931');
    expect(formatNumber(-0.0000001, 2)).toBe('-0.0000001');
    expect(formatNumber(-1e-30 * 0)).toBe('0');
    expect(formatNumber(Number.NaN)).toBe('—');
    expect(formatFixed(-0.04)).toBe('0');
    expect(formatFixed(1234.56)).toBe('1,234.6');
    expect(formatCount(3520)).toBe('3,520');
  });

  it('writes quantities with grouping in both unit systems', () => {
    // 1 kg/s = 3600 kg/h = 7936.6 lb/h (1 lb = 0.45359237 kg, exact by definition)
    expect(formatQuantity(1, 'massFlow', 'SI')).toBe('3,600 kg/h');
    expect(formatQuantity(1, 'massFlow', 'US')).toBe('7,937 lb/h');
    // 1.25e6 W = 4,265,000 Btu/h (1 Btu/h = 0.29307107 W, IT Btu)
    expect(formatQuantity(1.25e6, 'power', 'US', { digits: 3 })).toBe('4,270,000 Btu/h');
    expect(formatQuantity(-0.0000001, 'temperatureDifference', 'SI')).toBe('-0.0000001 K');
    expect(formatQuantity(-1e-18, 'length', 'SI', { digits: 2 })).toBe('-0.000000000000001 mm');
    expect(formatQuantity(-1e-30, 'length', 'SI', { digits: 2 })).toBe('0 mm');
  });
});

describe('plurals', () => {
  it('says 1 order and 2 orders', () => {
    expect(plural(1, 'order')).toBe('1 order');
    expect(plural(2, 'order')).toBe('2 orders');
    expect(plural(0, 'quote')).toBe('0 quotes');
    expect(plural(1, 'pass', 'passes')).toBe('1 pass');
    expect(plural(1200, 'tube')).toBe('1,200 tubes');
  });
});

describe('purchase orders', () => {
  it('never doubles the PO prefix', () => {
    expect(poLabel('4500123')).toBe('PO 4500123');
    expect(poLabel('PO-88412')).toBe('PO-88412');
    expect(poLabel('po 88412')).toBe('po 88412');
    expect(poLabel('P.O. 7')).toBe('P.O. 7');
    expect(poLabel('HPC-PO-88412')).toBe('PO HPC-PO-88412');
    expect(poLabel('POLARIS-1')).toBe('PO POLARIS-1');
  });
});

describe('money', () => {
  it('writes minor units with the currency and grouping', () => {
    expect(formatMoney(1_738_884, 'USD')).toBe('US$17,388.84');
    expect(formatMoney(-36_946, 'USD')).toBe('-US$369.46');
    expect(formatMoney(120_000, 'EUR')).toBe('€1,200.00');
    expect(formatMoney(5000, 'JPY')).toBe('JP¥5,000');
  });
});

describe('dates', () => {
  it('one day-month-year form for dates and date-times', () => {
    expect(formatDate('2026-03-12')).toBe('12 Mar 2026');
    expect(formatDate('2026-03-12T23:30:00Z', { timeZone: 'UTC' })).toBe('12 Mar 2026');
    expect(formatDate('2026-03-12T23:30:00Z', { timeZone: 'Asia/Tokyo' })).toBe('13 Mar 2026');
    expect(formatDateTime('2026-03-12T07:05:00Z', { timeZone: 'UTC' })).toBe('12 Mar 2026, 07:05');
    expect(formatDateTime('2026-03-12T19:05:00Z', { timeZone: 'UTC' })).toBe('12 Mar 2026, 19:05');
    expect(formatDate(null)).toBe('—');
    expect(formatDate('not a date')).toBe('not a date');
  });

  it('a bare calendar day stays that day in every zone', () => {
    for (const timeZone of ['Pacific/Honolulu', 'UTC', 'Pacific/Kiritimati']) {
      expect(formatDate('2027-03-31', { timeZone })).toBe('31 Mar 2027');
    }
  });
});
