import { describe, expect, it } from 'vitest';
import * as domain from './index';

describe('the public contract of issue 3', () => {
  it.each([
    'polygonArea',
    'trimLengthsForRun',
    'matAreaForDeck',
    'resinForMat',
    'laminateThicknessMm',
    'dewPointC',
    'checkLayingConditions',
    'catalystPercent',
    'checkFall',
    'choosePacks',
    'allocateFefo',
    'valueInventory',
    'vatOnInvoice',
    'estimateRoof',
    'priceEstimate',
    'expiryDate',
    'isExpired',
    'daysToExpiry',
    'lotUsableOn',
    'checkSegregation',
    'checkFlammablesCapacity',
    'checkStorageTemperature',
    'ledgerBalance',
    'countVariance',
    'shortfallToOrder',
    'cautionsFor',
    'workingTimeHint',
    'toDecimal',
    'costFromStock',
  ])('exports %s', (name) => {
    expect(typeof (domain as Record<string, unknown>)[name]).toBe('function');
  });

  it('exports DomainError, Decimal and DEFAULT_BUILD_UP', () => {
    expect(new domain.DomainError('x')).toBeInstanceOf(Error);
    expect(new domain.DomainError('x').name).toBe('DomainError');
    expect(new domain.DomainError('x').code).toBe('invalid-input');
    expect(new domain.Decimal('1.5').toString()).toBe('1.5');
    expect(domain.DEFAULT_BUILD_UP.matGsm).toBe(450);
  });
});
