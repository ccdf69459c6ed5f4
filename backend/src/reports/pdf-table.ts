import { MARGIN, type Doc } from './pdf-kit';

export interface Column {
  header: string;
  width: number;
  align?: 'left' | 'right';
}

const ROW = 14;

/**
 * A table with a bold header row, repeated at the top of each page it runs onto. A heading too
 * long for its column wraps, and the header row grows to hold it; body cells stay on one line.
 */
export function table(doc: Doc, columns: Column[], rows: string[][]): void {
  const bottom = doc.page.height - MARGIN - 20;
  doc.font('bold').fontSize(8.5);
  const headerHeight = Math.max(
    ROW,
    ...columns.map((c) => doc.heightOfString(c.header, { width: c.width - 4 }) + 5),
  );
  const drawRow = (cells: string[], bold: boolean) => {
    const height = bold ? headerHeight : ROW;
    if (doc.y + height > bottom) {
      doc.addPage();
      drawRow(
        columns.map((c) => c.header),
        true,
      );
    }
    const y = doc.y;
    let x = MARGIN;
    doc.font(bold ? 'bold' : 'text').fontSize(8.5);
    cells.forEach((cell, i) => {
      const column = columns[i];
      doc.text(cell, x + 2, y + 3, {
        width: column.width - 4,
        align: column.align ?? 'left',
        lineBreak: bold,
        ellipsis: !bold,
      });
      x += column.width;
    });
    const width = columns.reduce((sum, c) => sum + c.width, 0);
    doc
      .moveTo(MARGIN, y + height)
      .lineTo(MARGIN + width, y + height)
      .lineWidth(bold ? 0.8 : 0.3)
      .strokeColor(bold ? '#333333' : '#bbbbbb')
      .stroke();
    doc.x = MARGIN;
    doc.y = y + height;
  };
  drawRow(
    columns.map((c) => c.header),
    true,
  );
  rows.forEach((row) => drawRow(row, false));
  doc.font('text').fontSize(10).fillColor('black').strokeColor('black');
  doc.moveDown(0.5);
}
