import { Decimal } from '@potlife/domain';
import type { EstimateResponse } from './dto/estimate.dto';
import { cautionsBlock, heading, newPdf, pdfBuffer, pounds } from './pdf';

export interface QuoteData {
  company: {
    name: string;
    address: string | null;
    phone: string | null;
    email: string | null;
    vatNumber: string | null;
  };
  customer: { name: string; contactName: string | null; billingAddress: string | null };
  job: {
    reference: string;
    title: string;
    siteAddress: string;
    substrate: string;
    topcoatColour: string | null;
  };
  estimate: EstimateResponse;
  layers: string;
  matGsm: string;
  issuedOn: string;
  validUntil: string;
}

const SUBSTRATE_WORDS: Record<string, string> = {
  'timber-deck': 'timber deck',
  osb: 'OSB deck',
  'existing-felt': 'existing felt roof',
  asphalt: 'existing asphalt roof',
  concrete: 'concrete deck',
  'old-grp': 'existing GRP roof',
};

const m = (v: string, places = 1) => new Decimal(v).toDecimalPlaces(places).toString();

/** The scope of the work in plain words, from the estimate's take-off. */
export function scopeOfWork(d: QuoteData): string[] {
  const e = d.estimate;
  const trims = e.lines
    .filter((l) => l.role.startsWith('trim:') && l.metres)
    .map((l) => `${m(l.metres as string)} m of ${l.role.slice(5)} trim`);
  const scope = [
    `Prepare the ${SUBSTRATE_WORDS[d.job.substrate] ?? d.job.substrate} (${m(e.deckAreaM2)} m²) so it is sound, dry and clean, and fix timber battens at the edges.`,
  ];
  if (trims.length) {
    scope.push(
      `Fix pre-formed GRP edge trims: ${trims.join(', ')}, with joints and corners dressed in glass bandage.`,
    );
  }
  const layers = new Decimal(d.layers);
  scope.push(
    `Laminate ${m(e.laminatedAreaM2)} m²${new Decimal(e.upstandAreaM2).gt(0) ? ` (including ${m(e.upstandAreaM2)} m² of wall upstands)` : ''} with ${
      layers.eq(1) ? 'one layer' : `${layers.toString()} layers`
    } of ${d.matGsm} g/m² glass-fibre mat in polyester resin, consolidated to drive out air.`,
  );
  const details: string[] = [];
  if (e.pipes > 0) {
    details.push(`${e.pipes} pipe${e.pipes === 1 ? '' : 's'}`);
  }
  if (e.outlets > 0) {
    details.push(`${e.outlets} outlet${e.outlets === 1 ? '' : 's'}`);
  }
  if (details.length) {
    scope.push(`Dress ${details.join(' and ')} into the roof.`);
  }
  scope.push(
    `Finish with ${d.job.topcoatColour ? `a ${d.job.topcoatColour.toLowerCase()}` : 'a'} pigmented topcoat over the roof and trims once the laminate has cured and been sanded.`,
  );
  scope.push('Clear away our materials and waste from site.');
  return scope;
}

/** The customer's quote: company, customer, site, scope, price with VAT, validity and the trade's cautions. */
export async function renderQuote(d: QuoteData): Promise<Buffer> {
  const doc = newPdf(`Quote ${d.job.reference}`);
  const e = d.estimate;
  doc.font('bold').fontSize(18).fillColor('#1d2b36').text(d.company.name);
  doc.font('body').fontSize(9).fillColor('#444444');
  for (const line of [
    d.company.address,
    d.company.phone,
    d.company.email,
    d.company.vatNumber ? `VAT ${d.company.vatNumber}` : null,
  ]) {
    if (line) {
      doc.text(line);
    }
  }
  doc.moveDown(1).fillColor('#222222').fontSize(10);
  doc.font('bold').fontSize(15).text(`Quote ${d.job.reference}/${e.version}`).font('body').fontSize(10);
  doc.text(`Date: ${d.issuedOn}    Valid until: ${d.validUntil}`);
  heading(doc, 'For');
  doc.text(d.customer.name);
  if (d.customer.contactName) {
    doc.text(`Attn. ${d.customer.contactName}`);
  }
  if (d.customer.billingAddress) {
    doc.text(d.customer.billingAddress);
  }
  heading(doc, 'Site');
  doc.text(`${d.job.title}`).text(d.job.siteAddress);
  heading(doc, 'The work');
  for (const s of scopeOfWork(d)) {
    doc.text(`•  ${s}`, { indent: 0 }).moveDown(0.2);
  }
  heading(doc, 'Price');
  const rows: [string, string][] = [
    ['Price (excluding VAT)', pounds(e.price.net)],
    [`VAT at ${e.price.vatRatePct} %`, pounds(e.price.vat)],
    ['Total', pounds(e.price.gross)],
  ];
  for (const [label, value] of rows) {
    const y = doc.y;
    doc
      .font(label === 'Total' ? 'bold' : 'body')
      .text(label, 50, y)
      .text(value, 350, y, { width: 195, align: 'right' });
  }
  doc.font('body').moveDown(0.5);
  doc
    .fontSize(9)
    .text(
      `This quote holds until ${d.validUntil}. Work is laid only in fit weather (dry, at least 5 °C, the deck above the dew point); a day lost to the weather moves the date, not the price.`,
      50,
    );
  cautionsBlock(
    doc,
    e.cautions,
    'Hand-laid GRP roofing uses flammable resins, an organic peroxide catalyst and work at height. Our crew follows the precautions below; please keep people and pets clear of the work area and let us know of anything on site we should plan around.',
  );
  return pdfBuffer(doc);
}
