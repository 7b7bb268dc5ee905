import { CAUTIONS, cautionIdsFor, MaterialKind } from '@potlife/domain';
import { existsSync } from 'node:fs';
import path from 'node:path';
import PDFDocument from 'pdfkit';
import QRCode from 'qrcode';

/** One label to stick on a drum, tin or roll. */
export interface LabelData {
  lotId: string;
  url: string;
  materialName: string;
  materialCode: string;
  materialKind: MaterialKind;
  hazardClass: string;
  unNumber: string | null;
  batchNumber: string | null;
  expiresOn: string | null;
  receivedOn: string;
  /** e.g. "25 kg" (one pack) or "100 kg" (the lot) */
  quantityText: string;
  /** e.g. "Pack 2 of 4" */
  packText: string | null;
  receiptNumber: number | null;
}

/** 100 × 70 mm, a common size of printable label; one label per page. */
const MM = 72 / 25.4;
export const LABEL_SIZE: [number, number] = [100 * MM, 70 * MM];

function fontFile(weight: 400 | 700): string | null {
  try {
    const dir = path.dirname(require.resolve('@fontsource/manrope/package.json'));
    const file = path.join(dir, 'files', `manrope-latin-${weight}-normal.woff`);
    return existsSync(file) ? file : null;
  } catch {
    return null;
  }
}

/**
 * The short caution printed on a label where it applies: catalyst (organic peroxide) and
 * flammable liquids, with the domain's caution titles. Always ends by deferring to the SDS.
 */
export function labelCaution(kind: MaterialKind, hazardClass: string): { title: string; text: string } | null {
  const ids = cautionIdsFor(kind);
  const title = (id: string) => CAUTIONS.find((c) => c.id === id)?.title ?? id;
  if (hazardClass === '5.2' || ids.includes('catalyst')) {
    return {
      title: `${title('catalyst')} · class 5.2`,
      text: 'Keep in the peroxide store, in this container, away from heat, accelerators and flammables. Corrosive to eyes: wear eye protection and gloves. Never mix directly with accelerator. Follow the safety data sheet.',
    };
  }
  if (hazardClass === '3' || ids.includes('flammable')) {
    return {
      title: `${title('flammable')} · class 3`,
      text: 'No smoking, flames or hot work nearby. Keep closed; bring out only what the day needs. Follow the safety data sheet.',
    };
  }
  if (hazardClass !== 'none') {
    return { title: `Dangerous goods · class ${hazardClass}`, text: 'Follow the safety data sheet, local codes and licensed practice.' };
  }
  return null;
}

/** Renders labels, one per page, each with a QR code of the lot's page. */
export async function renderLabels(labels: readonly LabelData[]): Promise<Buffer> {
  const doc = new PDFDocument({ size: LABEL_SIZE, margin: 0, autoFirstPage: false, info: { Title: 'Potlife lot labels', Creator: 'Potlife' } });
  const regular = fontFile(400);
  const bold = fontFile(700);
  doc.registerFont('body', regular ?? 'Helvetica');
  doc.registerFont('bold', bold ?? 'Helvetica-Bold');
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  // Each QR code is decoded and embedded once per document, then drawn on every label of its lot
  // (pdfkit's openImage; its type definitions leave it out).
  const images = doc as unknown as { openImage(src: Buffer): object };
  const qrCache = new Map<string, object>();
  const [w, h] = LABEL_SIZE;
  const pad = 4 * MM;
  const qrSize = 30 * MM;
  for (const label of labels) {
    let qr = qrCache.get(label.url);
    if (!qr) {
      qr = images.openImage(await QRCode.toBuffer(label.url, { type: 'png', errorCorrectionLevel: 'M', margin: 1, width: 240 }));
      qrCache.set(label.url, qr);
    }
    doc.addPage({ size: LABEL_SIZE, margin: 0 });
    doc.image(qr as Buffer, w - pad - qrSize, pad, { width: qrSize, height: qrSize });
    const textW = w - 3 * pad - qrSize;
    let y = pad;
    doc.font('bold').fontSize(12).fillColor('black').text(label.materialName, pad, y, { width: textW, height: 30, ellipsis: true });
    y = Math.max(doc.y, y + 14) + 2;
    doc.font('body').fontSize(8).text(label.materialCode, pad, y, { width: textW });
    y = doc.y + 3;
    const line = (k: string, v: string) => {
      doc.font('body').fontSize(8).text(k, pad, y, { width: 16 * MM, continued: false });
      doc.font('bold').fontSize(9).text(v, pad + 16 * MM, y - 0.5, { width: textW - 16 * MM });
      y = doc.y + 1.5;
    };
    line('Batch', label.batchNumber ?? '—');
    line('Expires', label.expiresOn ?? 'no expiry');
    line('Quantity', label.packText ? `${label.quantityText} · ${label.packText}` : label.quantityText);
    line('Received', `${label.receivedOn}${label.receiptNumber ? ` · receipt ${label.receiptNumber}` : ''}`);
    doc.font('body').fontSize(6.5).fillColor('#444444').text(`Lot ${label.lotId.slice(0, 8)}`, w - pad - qrSize, pad + qrSize + 1, { width: qrSize, align: 'center' });
    const caution = labelCaution(label.materialKind, label.hazardClass);
    const boxTop = Math.max(y + 2, pad + qrSize + 10);
    if (caution) {
      const boxH = h - pad - boxTop;
      doc.save().lineWidth(1.2).strokeColor('black').rect(pad, boxTop, w - 2 * pad, boxH).stroke().restore();
      const un = label.unNumber ? `UN${label.unNumber.replace(/^UN/i, '')} · ` : '';
      doc.font('bold').fontSize(8).fillColor('black').text(`${un}${caution.title}`.toUpperCase(), pad + 3, boxTop + 3, { width: w - 2 * pad - 6 });
      doc.font('body').fontSize(7).text(caution.text, pad + 3, doc.y + 1, { width: w - 2 * pad - 6, height: boxH - 14, ellipsis: true });
    } else {
      doc.font('body').fontSize(7).fillColor('#444444').text('Scan the code to see this lot in Potlife.', pad, boxTop + 2, { width: w - 2 * pad });
    }
  }
  if (labels.length === 0) {
    doc.addPage({ size: LABEL_SIZE, margin: 0 });
    doc.font('body').fontSize(10).text('Nothing to label: no packs were received.', pad, pad, { width: w - 2 * pad });
  }
  doc.end();
  return done;
}
