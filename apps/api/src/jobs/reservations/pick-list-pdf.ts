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
    heading(doc, 'Needed but not reserved (pick the oldest usable lot)');
    for (const u of p.unreserved) {
      doc.text(`[  ]  ${u.quantity} ${unit(u.unit)}  ${u.material.name} (${u.material.code})`);
    }
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
