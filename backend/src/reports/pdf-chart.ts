import { MARGIN, type Doc } from './pdf-kit';

export interface Series {
  label: string;
  points: [number, number][];
  /** Drawn as steps (a storey quantity, constant over the storey height). */
  steps?: boolean;
  dash?: number;
  /** Line width in points (default 1.1). */
  width?: number;
  /** Its grey (default: by its place in the list). */
  grey?: string;
  markers?: boolean;
  /** Markers only, no line between them (e.g. the modal periods on a spectrum). */
  pointsOnly?: boolean;
}

/** Round tick values covering [min, max], about `count` of them. */
function ticks(min: number, max: number, count = 5): number[] {
  const span = max - min || Math.abs(max) || 1;
  const raw = span / count;
  const magnitude = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * magnitude).find((s) => s >= raw) ?? raw;
  const first = Math.floor(min / step + 1e-9) * step;
  const last = Math.ceil(max / step - 1e-9) * step;
  const out: number[] = [];
  for (let v = first; v <= last + step * 1e-9; v += step) out.push(Number(v.toPrecision(12)));
  return out;
}

const label = (v: number) => v.toLocaleString('en-US', { maximumFractionDigits: 6 });

/**
 * A line chart drawn as vector graphics: axes with round ticks, each series in grey with its own
 * dash pattern (the legend names them), so it reads in black and white.
 */
export function lineChart(
  doc: Doc,
  options: {
    title: string;
    xLabel: string;
    yLabel: string;
    series: Series[];
    width: number;
    height: number;
    x?: number;
  },
): void {
  const left = (options.x ?? MARGIN) + 40;
  const top = doc.y + 16;
  const width = options.width - 50;
  const height = options.height - 60;
  const all = options.series.flatMap((s) => s.points);
  const xs = ticks(Math.min(0, ...all.map((p) => p[0])), Math.max(...all.map((p) => p[0])));
  const ys = ticks(Math.min(0, ...all.map((p) => p[1])), Math.max(...all.map((p) => p[1])));
  const [x0, x1, y0, y1] = [xs[0], xs[xs.length - 1], ys[0], ys[ys.length - 1]];
  const px = (x: number) => left + ((x - x0) / (x1 - x0 || 1)) * width;
  const py = (y: number) => top + height - ((y - y0) / (y1 - y0 || 1)) * height;

  doc
    .font('bold')
    .fontSize(9)
    .text(options.title, options.x ?? MARGIN, doc.y, { width: options.width });
  doc.font('text').fontSize(7).lineWidth(0.3).strokeColor('#cccccc');
  xs.forEach((x) => {
    doc
      .moveTo(px(x), top)
      .lineTo(px(x), top + height)
      .stroke();
    doc
      .fillColor('#333333')
      .text(label(x), px(x) - 20, top + height + 3, { width: 40, align: 'center' });
  });
  ys.forEach((y) => {
    doc
      .moveTo(left, py(y))
      .lineTo(left + width, py(y))
      .stroke();
    doc.text(label(y), left - 42, py(y) - 3, { width: 38, align: 'right' });
  });
  doc.strokeColor('#000000').lineWidth(0.8).rect(left, top, width, height).stroke();
  doc.text(options.xLabel, left, top + height + 14, { width, align: 'center' });
  doc.save().rotate(-90, { origin: [left - 34, top + height / 2] });
  doc.text(options.yLabel, left - 34 - height / 2, top + height / 2 - 4, {
    width: height,
    align: 'center',
  });
  doc.restore();

  const greys = ['#000000', '#555555', '#888888', '#222222'];
  options.series.forEach((series, i) => {
    const points = series.steps
      ? series.points.flatMap(([x, y], k) => {
          const below = k === 0 ? 0 : series.points[k - 1][1];
          return [
            [x, below],
            [x, y],
          ] as [number, number][];
        })
      : series.points;
    doc.lineWidth(series.width ?? 1.1).strokeColor(series.grey ?? greys[i % greys.length]);
    if (series.dash) doc.dash(series.dash, { space: series.dash });
    points.forEach(([x, y], k) => (k === 0 ? doc.moveTo(px(x), py(y)) : doc.lineTo(px(x), py(y))));
    doc.stroke().undash();
    if (series.markers) {
      points.forEach(([x, y]) =>
        doc
          .circle(px(x), py(y), 1.6)
          .fillColor(greys[i % greys.length])
          .fill(),
      );
    }
  });
  // Legend.
  let lx = left;
  const ly = top + height + 26;
  options.series.forEach((series, i) => {
    doc.lineWidth(series.width ?? 1.1).strokeColor(series.grey ?? greys[i % greys.length]);
    if (series.dash) doc.dash(series.dash, { space: series.dash });
    doc
      .moveTo(lx, ly + 3)
      .lineTo(lx + 16, ly + 3)
      .stroke()
      .undash();
    doc.fillColor('#000000').text(series.label, lx + 20, ly, { lineBreak: false });
    lx += 28 + doc.widthOfString(series.label);
  });
  doc.fillColor('black').strokeColor('black').lineWidth(1).fontSize(10);
  doc.x = MARGIN;
  doc.y = top + height + 44;
}
