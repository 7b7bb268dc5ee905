import { BadRequestException, ConflictException } from '@nestjs/common';
import { QueryFailedError } from 'typeorm';
import type { DataSource } from 'typeorm';
import { CatalogueService } from './catalogue.service';
import type { CreateMaterialDto } from './dto/material.dto';

const user = { id: 'u1', companyId: 'c1', email: 'o@x.test', name: 'O', role: 'owner' as const };

function serviceWith(save: jest.Mock) {
  const repo = { create: (x: object) => ({ ...x }), save };
  const db = { getRepository: () => repo } as unknown as DataSource;
  return new CatalogueService(db);
}

// Mat weights and widths are common trade practice, no source (TRADE.md [practice]).
const mat: CreateMaterialDto = { code: 'MAT-450', name: 'Mat', kind: 'mat', stockUnit: 'm2', packSizes: [{ size: '64.0', label: 'roll' }], matGsm: 450, rollWidthM: '1.040' };

describe('CatalogueService.create', () => {
  it('saves the fields normalised, with the defaults, scoped to the company', async () => {
    const save = jest.fn(async (x: object) => ({ ...x, id: 'm1', createdAt: new Date(0), updatedAt: new Date(0) }));
    const res = await serviceWith(save).create(user, mat);
    expect(save).toHaveBeenCalledWith(expect.objectContaining({ companyId: 'c1', rollWidthM: '1.04', packSizes: [{ size: '64', label: 'roll' }], hazardClass: 'none', lotTracked: true }));
    expect(res).toMatchObject({ id: 'm1', code: 'MAT-450', rollWidthM: '1.04', createdAt: '1970-01-01T00:00:00.000Z' });
  });

  it('refuses a rule between fields with 400 before touching the database', async () => {
    const save = jest.fn();
    await expect(serviceWith(save).create(user, { ...mat, matGsm: undefined })).rejects.toThrow(BadRequestException);
    expect(save).not.toHaveBeenCalled();
  });

  it('turns a duplicate code into 409 naming the code', async () => {
    const dup = new QueryFailedError('INSERT', [], Object.assign(new Error('dup'), { code: '23505', constraint: 'materials_company_code_key' }));
    const save = jest.fn().mockRejectedValue(dup);
    await expect(serviceWith(save).create(user, mat)).rejects.toThrow(new ConflictException('The code MAT-450 is already used by another material; codes are unique in the company'));
  });

  it('findByIds asks for nothing when no id is an id', async () => {
    const save = jest.fn();
    expect(await serviceWith(save).findByIds('c1', ['not-an-id'])).toEqual([]);
  });
});
