import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import dayjs from 'dayjs';
import { DataSource } from 'typeorm';
import type { AuthUser } from '../common/current-user';
import { CompaniesService } from '../companies/companies.service';
import { CustomersService } from '../customers/customers.service';
import { jobReference } from './entities/job.entity';
import { EstimatesService } from './estimates.service';
import { JobsService } from './jobs.service';
import { renderQuote } from './quote-pdf';

@Injectable()
export class QuoteService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly jobs: JobsService,
    private readonly estimates: EstimatesService,
    private readonly companies: CompaniesService,
    private readonly customers: CustomersService,
  ) {}

  /** The customer's quote for an estimate version, valid for the company's quote validity (30 days by default). */
  async render(user: AuthUser, jobId: string, version: number): Promise<{ pdf: Buffer; filename: string }> {
    const job = await this.jobs.find(user.companyId, jobId);
    const e = await this.estimates.findVersion(user.companyId, job.id, version);
    const [bundle, company, customer, settings] = await Promise.all([
      this.estimates.bundle(user.companyId, e.id),
      this.companies.get(user.companyId),
      this.customers.find(user.companyId, job.customerId),
      this.jobs.settings(user.companyId, this.db.manager),
    ]);
    const issued = dayjs(e.createdAt);
    const reference = jobReference(job.number);
    const pdf = await renderQuote({
      company: {
        name: company.name,
        address: company.address,
        phone: company.phone,
        email: company.email,
        vatNumber: company.vatNumber,
      },
      customer: {
        name: customer.name,
        contactName: customer.contactName,
        billingAddress: customer.billingAddress,
      },
      job: {
        reference,
        title: job.title,
        siteAddress: job.siteAddress,
        substrate: job.substrate,
        topcoatColour: job.topcoatColour,
      },
      estimate: this.estimates.respond(bundle),
      layers: e.buildUp.rates.layers,
      matGsm: e.buildUp.rates.matGsm,
      issuedOn: issued.format('D MMMM YYYY'),
      validUntil: issued.add(settings.quoteValidityDays, 'day').format('D MMMM YYYY'),
    });
    return { pdf, filename: `quote-${reference}-v${version}.pdf` };
  }
}
