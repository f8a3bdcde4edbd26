/** Small layout helpers shared by the document builders. */
import type { Content, ContentTable, CustomTableLayout, TableCell } from 'pdfmake/interfaces';
import { COLOR } from './page.js';

export const GRID: CustomTableLayout = {
  hLineWidth: (i, node) => (i === 0 || i === (node.table.headerRows ?? 0) || i === node.table.body.length ? 0.9 : 0.4),
  vLineWidth: () => 0.4,
  hLineColor: () => COLOR.rule,
  vLineColor: () => COLOR.rule,
  paddingLeft: () => 3,
  paddingRight: () => 3,
  paddingTop: () => 2,
  paddingBottom: () => 2,
  fillColor: (row: number) => (row === 0 ? COLOR.tint : null),
};

export function heading(text: string, level: 1 | 2 | 3 = 1, id?: string): Content {
  const size = level === 1 ? 14 : level === 2 ? 11.5 : 10;
  return {
    text,
    bold: true,
    fontSize: size,
    margin: [0, level === 1 ? 14 : 9, 0, 4],
    headlineLevel: level,
    ...(id === undefined ? {} : { id }),
  };
}

/** A level-1 heading that starts a new page (major sections of the report). */
export function headingOnNewPage(text: string): Content {
  return { ...(heading(text, 1) as object), pageBreak: 'before' } as Content;
}

/**
 * A heading kept on the same page as the (short) block that follows it: pdfmake's pageBreakBefore
 * test does not see a following paragraph that would itself move, so a heading could end a page.
 * Use only with small blocks; a table longer than a page must not be made unbreakable.
 */
export function headingWith(text: string, level: 1 | 2 | 3, first: Content): Content {
  return { stack: [heading(text, level), first], unbreakable: true };
}

export function th(text: string): TableCell {
  return { text, bold: true, fontSize: 7.5 };
}

/** A table with a header row; `widths` in points or '*' / 'auto'. */
export function gridTable(header: readonly string[], rows: TableCell[][], widths: Array<number | string>, fontSize = 8): ContentTable {
  return {
    table: { headerRows: 1, keepWithHeaderRows: 1, dontBreakRows: true, widths, body: [header.map(th), ...rows] },
    layout: GRID,
    fontSize,
    margin: [0, 2, 0, 6],
  };
}

/** Two-column key/value table (label column bold). */
export function factTable(rows: ReadonlyArray<readonly [string, Content]>, labelWidth = 130, fontSize = 10): ContentTable {
  return {
    table: { widths: [labelWidth, '*'], body: rows.map(([k, v]) => [{ text: k, bold: true }, v] as TableCell[]) },
    layout: {
      hLineWidth: () => 0.4,
      vLineWidth: () => 0,
      hLineColor: () => COLOR.rule,
      paddingTop: () => 3,
      paddingBottom: () => 3,
    },
    fontSize,
  };
}

export function paragraph(text: string | Content[], extra: Record<string, unknown> = {}): Content {
  return { text, margin: [0, 0, 0, 4], ...extra } as Content;
}

export function bullets(items: readonly string[], fontSize?: number): Content {
  return { ul: [...items], margin: [0, 0, 0, 4], ...(fontSize === undefined ? {} : { fontSize }) };
}

/** A yes/no cell, green or red, with the reason after the verdict. */
export function verdictCell(ok: boolean, detail: string, fontSize = 7.5): TableCell {
  return {
    text: [{ text: ok ? 'YES' : 'NO', bold: true, color: ok ? COLOR.good : COLOR.bad, fontSize: fontSize + 0.5 }, ...(detail === '' ? [] : [{ text: `  ${detail}`, fontSize: fontSize - 0.5 }])],
    fillColor: ok ? COLOR.goodTint : COLOR.badTint,
    fontSize,
  };
}
