import { Decimal } from '@potlife/domain';
import type { PickListResponse } from './reservation.dto';
import { cautionsBlock, heading, newPdf, pdfBuffer } from '../pdf';

const unit = (u: string) => (u === 'm2' ? 'm²' : u);

/** The printable pick list: what to take to the job, lot by lot and from where, with the cautions. */
export async function renderPickList(p: PickListResponse, companyName: string): Promise<Buffer> {
  const doc = newPdf(`Pick list ${p.reference}`);
  doc.font('bold').fontSize(16).text(`Pick list ${p.reference}`).font('body').fontSize(10);
  doc.text(`${companyName}`).moveDown(0.4);
  doc.text(p.title).text(p.siteAddress);
  doc.text(`Job date: ${p.jobDate ?? 'not scheduled'}${p.crew ? `    Crew: ${p.crew}` : ''}`);
  heading(doc, 'Reserved for this job');
  if (p.lines.length === 0) {
    doc.text('Nothing is reserved yet: reserve the stock from the job’s materials first.');
  }
  for (const l of p.lines) {
    const where =
      l.places.map((pl) => `${pl.locationName} (${pl.quantity} ${unit(l.unit)})`).join(', ') ||
      'not in stock';
    doc.font('bold').text(`[  ]  ${l.quantity} ${unit(l.unit)}  ${l.material.name}`, { continued: false });
    doc
      .font('body')
      .fontSize(9)
      .text(
        `     ${l.material.code} · batch ${l.lot.batchNumber ?? '—'} · use by ${l.lot.expiresOn ?? 'no expiry'} · from ${where}`,
      );
    for (const f of l.flags) {
      doc.fillColor('#a4161a').text(`     ${f.message}`).fillColor('#222222');
    }
    doc.fontSize(10).moveDown(0.3);
  }
  if (p.unreserved.length) {
    heading(doc, 'Needed but not reserved: suggested lots, first expiring first');
    doc
      .fontSize(9)
      .text(
        `Lots offered are usable and in date until ${p.useBy} (the later of today and the job date, plus the ${p.marginDays}-day margin), less what other jobs hold.`,
      )
      .fontSize(10)
      .moveDown(0.3);
  }
  for (const u of p.unreserved) {
    doc.font('bold').text(`${u.quantity} ${unit(u.unit)}  ${u.material.name} (${u.material.code})`);
    doc.font('body').fontSize(9);
    const suggested = u.candidates.filter((c) => c.suggested !== null);
    for (const c of suggested) {
      const where =
        c.places.map((pl) => `${pl.locationName} (${pl.quantity} ${unit(u.unit)})`).join(', ') ||
        'location not known';
      doc.text(
        `[  ]  ${c.suggested} ${unit(u.unit)} from batch ${c.lot.batchNumber ?? '—'} · use by ${c.lot.expiresOn ?? 'no expiry'} · from ${where}`,
        { indent: 14 },
      );
    }
    const others = u.candidates.filter((c) => c.suggested === null);
    if (others.length) {
      doc
        .fillColor('#555555')
        .text(
          `Also usable: ${others.map((c) => `batch ${c.lot.batchNumber ?? '—'} (${c.free} ${unit(u.unit)}, use by ${c.lot.expiresOn ?? 'no expiry'})`).join('; ')}`,
          { indent: 14 },
        )
        .fillColor('#222222');
    }
    if (u.candidates.length === 0) {
      doc.fillColor('#a4161a').text('No usable lot in stock for this job: it must be ordered.', { indent: 14 });
    } else if (new Decimal(u.short).gt(0)) {
      doc
        .fillColor('#a4161a')
        .text(`${u.short} ${unit(u.unit)} more cannot be found in usable stock: it must be ordered.`, {
          indent: 14,
        });
    }
    for (const o of u.passedOver) {
      doc
        .fillColor('#a4161a')
        .text(`Not to be taken: batch ${o.lot.batchNumber ?? '—'}: ${o.flags.map((f) => f.message).join(' ')}`, {
          indent: 14,
        });
    }
    doc.fillColor('#222222').fontSize(10).moveDown(0.3);
  }
  if (p.issued.length) {
    heading(doc, 'Already sent to this job');
    for (const i of p.issued) {
      doc.text(
        `${i.material.name}: issued ${i.issued} ${unit(i.unit)}, returned ${i.returned} ${unit(i.unit)}`,
      );
    }
  }
  doc
    .moveDown(1)
    .text('Picked by: ____________________    Date: ____________    Checked by: ____________________');
  cautionsBlock(
    doc,
    p.cautions,
    'What is on this list needs these precautions on the way to site and on the roof.',
  );
  return pdfBuffer(doc);
}
