/**
 * The boat page's trend of each tried impeller's effective rating (analysis/boatTrend.ts): a small SVG,
 * one trial per step left to right, the drift from the first trials' mean up the side, the limits as a
 * grey band between dashed lines, each point's kind told by its shape and a word (first trials hollow
 * circles, later ones filled, outside the limits a cross labelled "outside"), and the flag in sentences.
 * Every number comes from the results; nothing here computes the rule.
 */
import type { BoatResult, ImpellerTrend } from '../analysis/index.ts';
import { escapeHtml } from './html.ts';

export interface TrendView {
  readonly heading: string;
  /** One plot per impeller with a baseline, as SVG markup we generate (text escaped). */
  readonly plots: readonly { readonly caption: string; readonly svg: string }[];
  readonly paragraphs: readonly string[];
}

const W = 640;
const H = 220;
const PAD = { left: 96, right: 120, top: 16, bottom: 40 };
const fmt = (x: number) => (Math.round(x * 10) / 10).toFixed(1);
const pct = (x: number) => `${x > 0 ? '+' : x < 0 ? '−' : ''}${Math.abs(Math.round(x * 10) / 10).toFixed(1)} %`;

/** The trend section of a boat page; null when no impeller has a baseline (fewer than three measured trials). */
export function trendView(result: BoatResult): TrendView | null {
  const trend = result.trend;
  if (!trend) return null;
  const label = (id: string) => result.alternatives.find((a) => a.impellerId === id)?.label ?? id;
  const plots = trend.impellers.filter((i) => i.baseline).map((i) => ({ caption: `${label(i.impellerId)}: effective rating against its first ${i.baseline!.trials} trials`, svg: plotSvg(i, label(i.impellerId)) }));
  if (plots.length === 0) return null;
  const flag = trend.flag;
  const paragraphs = [
    ...(flag ? [`Wear flag raised for ${label(flag.impellerId)}: its trial of ${flag.date} (${flag.wotRpm} rpm) lies outside the limits, ${pct(flag.driftPct)} from the first trials. ${flag.meaning} ${flag.action}`] : [`No wear flag: the latest trial of the fitted impeller lies inside its limits${trend.impellers.find((i) => i.impellerId === result.impellerId)?.verdict === 'tooFew' ? ', or it has too few trials to judge' : ''}.`]),
    trend.rule,
  ];
  return { heading: 'Impeller trend over the sea trials', plots, paragraphs };
}

function plotSvg(t: ImpellerTrend, label: string): string {
  const b = t.baseline!;
  const lo = (b.lowKw / b.meanKw - 1) * 100;
  const hi = (b.highKw / b.meanKw - 1) * 100;
  const drifts = t.points.map((p) => p.driftPct ?? 0);
  const span = Math.max(Math.abs(lo), Math.abs(hi), ...drifts.map(Math.abs)) * 1.15;
  const x = (i: number) => PAD.left + (t.points.length === 1 ? 0 : (i / (t.points.length - 1)) * (W - PAD.left - PAD.right));
  const y = (d: number) => PAD.top + ((span - d) / (2 * span)) * (H - PAD.top - PAD.bottom);
  const parts: string[] = [];
  parts.push(`<rect x="${PAD.left}" y="${fmt(y(hi))}" width="${W - PAD.left - PAD.right}" height="${fmt(y(lo) - y(hi))}" fill="#e4e4e4"/>`);
  for (const [d, name] of [[hi, 'upper limit'], [lo, 'lower limit']] as const) {
    parts.push(`<line x1="${PAD.left}" x2="${W - PAD.right}" y1="${fmt(y(d))}" y2="${fmt(y(d))}" stroke="#555" stroke-width="1" stroke-dasharray="5 3"/>`);
    parts.push(`<text x="${W - PAD.right + 4}" y="${fmt(y(d) + 4)}" font-size="11">${name} ${escapeHtml(pct(d))}</text>`);
  }
  parts.push(`<line x1="${PAD.left}" x2="${W - PAD.right}" y1="${fmt(y(0))}" y2="${fmt(y(0))}" stroke="#000" stroke-width="1"/>`);
  parts.push(`<text x="${W - PAD.right + 4}" y="${fmt(y(0) + 4)}" font-size="11">first trials' mean</text>`);
  parts.push(`<text x="4" y="${fmt(y(span * 0.8) + 4)}" font-size="11">rating up,</text><text x="4" y="${fmt(y(span * 0.8) + 18)}" font-size="11">rpm down</text>`);
  parts.push(`<text x="4" y="${fmt(y(-span * 0.8) - 10)}" font-size="11">rating down,</text><text x="4" y="${fmt(y(-span * 0.8) + 4)}" font-size="11">rpm up</text>`);
  parts.push(`<polyline points="${t.points.map((p, i) => `${fmt(x(i))},${fmt(y(p.driftPct ?? 0))}`).join(' ')}" fill="none" stroke="#000" stroke-width="1"/>`);
  t.points.forEach((p, i) => {
    const cx = fmt(x(i));
    const cy = fmt(y(p.driftPct ?? 0));
    if (p.outside === 'yes') {
      parts.push(`<path d="M${fmt(x(i) - 5)},${fmt(y(p.driftPct!) - 5)}l10,10m0,-10l-10,10" stroke="#000" stroke-width="2.5"/>`);
      parts.push(`<text x="${fmt(x(i) - 9)}" y="${fmt(y(p.driftPct!) + 4)}" font-size="11" font-weight="bold" text-anchor="end">outside</text>`);
    } else {
      parts.push(`<circle cx="${cx}" cy="${cy}" r="4" fill="${p.role === 'baseline' ? '#fff' : '#000'}" stroke="#000" stroke-width="1.5"/>`);
    }
    if (i === 0 || i === t.points.length - 1 || p.outside === 'yes') parts.push(`<text x="${cx}" y="${H - PAD.bottom + 16}" font-size="11" text-anchor="middle">${escapeHtml(p.date)}</text>`);
  });
  parts.push(`<text x="${PAD.left}" y="${H - 6}" font-size="11">○ first trials · ● later trials · ✕ outside the limits · left to right in date order</text>`);
  const summary = `${label}: ${t.points.length} trials; ${t.points.map((p) => `${p.date} ${p.wotRpm} rpm ${pct(p.driftPct ?? 0)}${p.outside === 'yes' ? ' outside' : ''}`).join('; ')}`;
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${W} ${H}" width="${W}" height="${H}" style="max-width:100%;height:auto" role="img" aria-label="${escapeHtml(summary)}" font-family="sans-serif">${parts.join('')}</svg>`;
}
