import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { EntityManager, Repository } from 'typeorm';
import { Company } from './entities/company.entity';

@Injectable()
export class CompaniesService {
  constructor(@InjectRepository(Company) private readonly companies: Repository<Company>) {}

  create(manager: EntityManager, name: string): Promise<Company> {
    return manager.getRepository(Company).save(manager.getRepository(Company).create({ name: name.trim() }));
  }

  async get(companyId: string): Promise<Company> {
    const company = await this.companies.findOneBy({ id: companyId });
    if (!company) {
      throw new NotFoundException('Company not found');
    }
    return company;
  }
}
