import PDFDocument from 'pdfkit';

export type Pdf = PDFKit.PDFDocument;

let fonts: { regular: string; bold: string } | null | undefined;

/** Manrope from @fontsource (WOFF, which pdfkit reads); Helvetica when the files are not there. */
function manrope(): { regular: string; bold: string } | null {
  if (fonts === undefined) {
    try {
      fonts = {
        regular: require.resolve('@fontsource/manrope/files/manrope-latin-400-normal.woff'),
        bold: require.resolve('@fontsource/manrope/files/manrope-latin-700-normal.woff'),
      };
    } catch {
      fonts = null;
    }
  }
  return fonts;
}

/** An A4 document with the body and bold fonts registered as "body" and "bold". */
export function newPdf(title: string): Pdf {
  const doc = new PDFDocument({
    size: 'A4',
    margin: 50,
    info: { Title: title, Producer: 'Potlife', Creator: 'Potlife' },
  });
  const f = manrope();
  if (f) {
    doc.registerFont('body', f.regular);
    doc.registerFont('bold', f.bold);
  } else {
    doc.registerFont('body', 'Helvetica');
    doc.registerFont('bold', 'Helvetica-Bold');
  }
  doc.font('body');
  return doc;
}

/** Ends the document and collects its bytes. */
export function pdfBuffer(doc: Pdf): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}

/** A heading in bold, then back to the body font. */
export function heading(doc: Pdf, text: string, size = 13): void {
  doc
    .moveDown(0.8)
    .font('bold')
    .fontSize(size)
    .fillColor('#1d2b36')
    .text(text)
    .font('body')
    .fontSize(10)
    .fillColor('#222222')
    .moveDown(0.3);
}

/** The trade's cautions, each title in bold with its text. */
export function cautionsBlock(
  doc: Pdf,
  cautions: readonly { title: string; text: string }[],
  intro: string,
): void {
  heading(doc, 'Safety');
  doc.fontSize(9).text(intro).moveDown(0.4);
  for (const c of cautions) {
    doc.font('bold').fontSize(9).text(c.title).font('body').text(c.text).moveDown(0.4);
  }
  doc.fontSize(10);
}

/** £1,234.56 */
export function pounds(amount: string): string {
  const [whole, pence = '00'] = amount.replace('-', '').split('.');
  const grouped = (whole ?? '0').replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `${amount.startsWith('-') ? '-' : ''}£${grouped}.${pence.padEnd(2, '0').slice(0, 2)}`;
}
