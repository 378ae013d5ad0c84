import "server-only";
import path from "node:path";
import PDFDocument from "pdfkit";

// The test report's page furniture and its one table primitive, on pdfkit with Noto Sans embedded
// (the @fontsource WOFF files; fontkit subsets them, so only the glyphs used are stored).

export type Doc = PDFKit.PDFDocument;
const FONTS = path.join(process.cwd(), "node_modules/@fontsource/noto-sans/files");
export const REGULAR = "Noto";
export const BOLD = "Noto-Bold";
export const MARGIN = { top: 72, bottom: 70, left: 48, right: 48 };
export const INK = "#1f2937";
export const MUTED = "#4b5563";
export const RULE = "#9ca3af";
export const ALERT = "#b91c1c";

export function newDoc(title: string): Doc {
  const doc = new PDFDocument({ size: "A4", margins: MARGIN, bufferPages: true, info: { Title: title, Creator: "Wickmark" } });
  doc.registerFont(REGULAR, path.join(FONTS, "noto-sans-latin-400-normal.woff"));
  doc.registerFont(BOLD, path.join(FONTS, "noto-sans-latin-700-normal.woff"));
  doc.font(REGULAR).fontSize(9).fillColor(INK);
  return doc;
}

export const contentWidth = (doc: Doc) => doc.page.width - MARGIN.left - MARGIN.right;
const bottom = (doc: Doc) => doc.page.height - MARGIN.bottom;

/** Starts a new page unless `height` points still fit on this one. */
export function ensureRoom(doc: Doc, height: number): void {
  if (doc.y + height > bottom(doc)) doc.addPage();
}

export function heading(doc: Doc, text: string): void {
  // A heading never ends a page: it keeps room for a table head and a few rows below it.
  ensureRoom(doc, 90);
  doc
    .moveDown(0.8)
    .font(BOLD)
    .fontSize(12)
    .fillColor(INK)
    .text(text, MARGIN.left, doc.y, { width: contentWidth(doc) });
  doc.moveDown(0.3).font(REGULAR).fontSize(9);
}

export function paragraph(doc: Doc, text: string, opts: { size?: number; color?: string; bold?: boolean } = {}): void {
  doc
    .font(opts.bold ? BOLD : REGULAR)
    .fontSize(opts.size ?? 9)
    .fillColor(opts.color ?? INK)
    .text(text, MARGIN.left, doc.y, { width: contentWidth(doc) });
  doc.fillColor(INK).font(REGULAR).fontSize(9);
}

/** Label–value pairs in two columns. */
export function facts(doc: Doc, rows: [string, string][]): void {
  const w = contentWidth(doc);
  for (const [label, value] of rows) {
    ensureRoom(doc, 14);
    const y = doc.y;
    doc.font(REGULAR).fontSize(9).fillColor(MUTED).text(label, MARGIN.left, y, { width: 130 });
    doc.fillColor(INK).text(value, MARGIN.left + 140, y, { width: w - 140 });
    doc.moveDown(0.15);
  }
}

export interface Column {
  head: string;
  width: number;
  align?: "left" | "right";
}

/** A table: bold column heads (units in the heads), numbers right-aligned, heads repeated on each page. */
export function table(doc: Doc, columns: Column[], rows: string[][], size = 8): void {
  const pad = 3;
  const heightOf = (cells: string[], font: string) => {
    doc.font(font).fontSize(size);
    return Math.max(...cells.map((c, i) => doc.heightOfString(c, { width: columns[i].width - 2 * pad }))) + 2 * pad;
  };
  const draw = (cells: string[], font: string, shade: boolean) => {
    const h = heightOf(cells, font);
    const y = doc.y;
    if (shade)
      doc
        .rect(
          MARGIN.left,
          y,
          columns.reduce((a, c) => a + c.width, 0),
          h,
        )
        .fill("#f3f4f6");
    let x = MARGIN.left;
    doc.font(font).fontSize(size).fillColor(INK);
    cells.forEach((c, i) => {
      doc.text(c, x + pad, y + pad, { width: columns[i].width - 2 * pad, align: columns[i].align ?? "left" });
      x += columns[i].width;
    });
    doc.y = y + h;
  };
  const head = () => {
    draw(
      columns.map((c) => c.head),
      BOLD,
      false,
    );
    doc
      .moveTo(MARGIN.left, doc.y)
      .lineTo(MARGIN.left + columns.reduce((a, c) => a + c.width, 0), doc.y)
      .lineWidth(0.6)
      .strokeColor(RULE)
      .stroke();
  };
  ensureRoom(
    doc,
    heightOf(
      columns.map((c) => c.head),
      BOLD,
    ) + 20,
  );
  head();
  rows.forEach((r, i) => {
    if (doc.y + heightOf(r, REGULAR) > bottom(doc)) {
      doc.addPage();
      head();
    }
    draw(r, REGULAR, i % 2 === 1);
  });
  doc.x = MARGIN.left;
  doc.font(REGULAR).fontSize(9);
}

/** A framed box holding the decision and its explanation. */
export function box(doc: Doc, title: string, lines: string[]): void {
  const w = contentWidth(doc);
  const inner = w - 24;
  doc.font(BOLD).fontSize(13);
  let h = doc.heightOfString(title, { width: inner }) + 20;
  doc.font(REGULAR).fontSize(9.5);
  for (const l of lines) h += doc.heightOfString(l, { width: inner }) + 4;
  ensureRoom(doc, h + 10);
  const y = doc.y;
  doc.rect(MARGIN.left, y, w, h).lineWidth(1.5).strokeColor(INK).stroke();
  doc
    .font(BOLD)
    .fontSize(13)
    .fillColor(INK)
    .text(title, MARGIN.left + 12, y + 10, { width: inner });
  doc.font(REGULAR).fontSize(9.5);
  for (const l of lines) doc.moveDown(0.3).text(l, MARGIN.left + 12, doc.y, { width: inner });
  doc.y = y + h + 6;
  doc.x = MARGIN.left;
  doc.fontSize(9);
}

/** A red bar down the left edge of every page of a draft (a shape, so the text stays clean to copy). */
function draftBar(doc: Doc): void {
  doc.rect(MARGIN.left - 30, MARGIN.top - 20, 8, doc.page.height - MARGIN.top - MARGIN.bottom + 10).fill(ALERT);
}

/** Header (lab, title, reference, revision) and footer (caution, page n of m) on every page. */
export function furnish(doc: Doc, header: { lab: string; title: string; reference: string; revision: string; draft: boolean }, caution: string): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const w = contentWidth(doc);
    const saved = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    if (header.draft) draftBar(doc);
    const accent = header.draft ? ALERT : RULE;
    doc
      .font(BOLD)
      .fontSize(9)
      .fillColor(INK)
      .text(header.lab, MARGIN.left, 30, { width: w * 0.4, lineBreak: false, ellipsis: true });
    doc
      .font(REGULAR)
      .fontSize(9)
      .text(`${header.title} · ${header.reference} · ${header.revision}`, MARGIN.left + w * 0.4, 30, { width: w * 0.6, align: "right", lineBreak: false });
    if (header.draft)
      doc
        .font(BOLD)
        .fontSize(8)
        .fillColor(ALERT)
        .text("DRAFT: not signed off, not a released result", MARGIN.left, 50, { width: w, align: "right", lineBreak: false });
    doc
      .fillColor(INK)
      .moveTo(MARGIN.left, 46)
      .lineTo(MARGIN.left + w, 46)
      .lineWidth(header.draft ? 1.2 : 0.6)
      .strokeColor(accent)
      .stroke();
    const fy = doc.page.height - 56;
    doc
      .moveTo(MARGIN.left, fy - 4)
      .lineTo(MARGIN.left + w, fy - 4)
      .lineWidth(0.6)
      .strokeColor(RULE)
      .stroke();
    doc
      .font(REGULAR)
      .fontSize(7)
      .fillColor(MUTED)
      .text(caution, MARGIN.left, fy, { width: w - 70 });
    doc.text(`Page ${i - range.start + 1} of ${range.count}`, MARGIN.left + w - 70, fy, { width: 70, align: "right", lineBreak: false });
    doc.page.margins.bottom = saved;
  }
  doc.fillColor(INK);
}

/** The finished document as bytes. */
export function toBuffer(doc: Doc): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
    doc.end();
  });
}
