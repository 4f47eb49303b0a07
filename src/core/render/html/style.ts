/**
 * The report page's one style sheet: system fonts only (nothing is fetched), colours as custom
 * properties switched by `prefers-color-scheme`, and a print layout on white paper.
 */
export const REPORT_CSS = `
:root {
  color-scheme: light dark;
  --bg: #ffffff; --fg: #1f2328; --muted: #59636e; --faint: #eef1f4; --line: #d1d9e0; --panel: #f6f8fa;
  --base: #8c959f; --head: #0969da; --turning: #0969da; --unturned: #bf8700; --exposed: #cf222e;
  --block: #cf222e; --warn: #9a6700; --info: #0969da; --ok: #1a7f37; --fix: #1a7f37;
  --budget: #cf222e; --band: rgba(191, 135, 0, 0.10); --area-base: rgba(140, 149, 159, 0.30); --area-head: rgba(9, 105, 218, 0.22);
}
@media (prefers-color-scheme: dark) {
  :root {
    --bg: #0d1117; --fg: #e6edf3; --muted: #9198a1; --faint: #161b22; --line: #30363d; --panel: #151b23;
    --base: #8b949e; --head: #4493f8; --turning: #4493f8; --unturned: #d29922; --exposed: #f85149;
    --block: #f85149; --warn: #d29922; --info: #4493f8; --ok: #3fb950; --fix: #3fb950;
    --budget: #f85149; --band: rgba(210, 153, 34, 0.14); --area-base: rgba(139, 148, 158, 0.30); --area-head: rgba(68, 147, 248, 0.28);
  }
}
* { box-sizing: border-box; }
body { margin: 0; background: var(--bg); color: var(--fg); font: 15px/1.5 system-ui, -apple-system, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif; }
main { max-width: 1240px; margin: 0 auto; padding: 24px 20px 48px; }
h1 { font-size: 22px; margin: 0 0 4px; }
h2 { font-size: 18px; margin: 0; word-break: break-all; }
h3 { font-size: 15px; margin: 18px 0 8px; }
code, .mono { font-family: ui-monospace, SFMono-Regular, Menlo, Consolas, monospace; font-size: 0.92em; }
code { background: var(--faint); padding: 1px 4px; border-radius: 4px; word-break: break-all; }
.muted { color: var(--muted); }
.banner { display: flex; flex-wrap: wrap; align-items: center; gap: 12px 18px; padding: 14px 18px; border-radius: 10px; background: var(--panel); border: 1px solid var(--line); border-left: 6px solid var(--ok); margin: 12px 0 18px; }
.banner.block { border-left-color: var(--block); }
.banner.warn { border-left-color: var(--warn); }
.verdict { font-size: 20px; font-weight: 700; }
.verdict.block { color: var(--block); } .verdict.warn { color: var(--warn); } .verdict.ok { color: var(--ok); }
.notes { margin: 0 0 18px; padding-left: 18px; color: var(--muted); }
.file { border: 1px solid var(--line); border-radius: 12px; padding: 18px; margin: 0 0 28px; background: var(--bg); }
.file > header { display: flex; flex-wrap: wrap; align-items: center; gap: 10px; margin-bottom: 12px; }
.chip { display: inline-block; padding: 1px 9px; border-radius: 999px; font-size: 12px; font-weight: 600; border: 1px solid currentColor; white-space: nowrap; }
.chip.block { color: var(--block); } .chip.warn { color: var(--warn); } .chip.info { color: var(--info); } .chip.ok { color: var(--ok); }
.cards { display: grid; grid-template-columns: repeat(auto-fill, minmax(210px, 1fr)); gap: 10px; margin: 0 0 16px; padding: 0; list-style: none; }
.card { border: 1px solid var(--line); border-radius: 10px; padding: 10px 12px; background: var(--panel); border-top: 4px solid var(--line); }
.card.bad { border-top-color: var(--block); } .card.good { border-top-color: var(--ok); } .card.warn { border-top-color: var(--warn); }
.card .label { font-size: 12px; color: var(--muted); text-transform: uppercase; letter-spacing: 0.04em; }
.card .value { font-size: 18px; font-weight: 650; margin-top: 2px; }
.card .value .from { color: var(--muted); font-weight: 500; }
.card .note { font-size: 13px; color: var(--muted); }
.charts { display: grid; grid-template-columns: repeat(auto-fit, minmax(480px, 1fr)); gap: 14px; }
figure { margin: 0; border: 1px solid var(--line); border-radius: 10px; padding: 10px 10px 6px; background: var(--bg); break-inside: avoid; }
figcaption { font-size: 13px; color: var(--muted); margin-top: 4px; }
figure.wide { grid-column: 1 / -1; }
figure h3 { margin: 2px 0 4px; }
.legend { display: flex; flex-wrap: wrap; gap: 4px 14px; font-size: 12px; color: var(--muted); margin: 0 0 2px; padding: 0; list-style: none; }
.legend i { display: inline-block; width: 14px; height: 10px; border-radius: 2px; margin-right: 5px; vertical-align: middle; }
.legend i.dash { height: 0; border-top: 2px dashed; border-radius: 0; background: none !important; }
.legend i.dash.sw-fix { border-color: var(--fix); } .legend i.dash.sw-head { border-color: var(--head); } .legend i.dash.sw-base { border-color: var(--base); }
.fix { display: flex; flex-wrap: wrap; gap: 6px 12px; align-items: baseline; border: 1px solid var(--fix); border-left: 6px solid var(--fix); border-radius: 10px; padding: 10px 14px; margin: 0 0 16px; background: var(--panel); }
.fix.partial { border-color: var(--warn); }
.fix .title { font-weight: 700; color: var(--fix); }
.fix .after { font-weight: 700; color: var(--fix); }
.fix.partial .title { color: var(--warn); }
svg.chart { width: 100%; height: auto; display: block; overflow: visible; }
svg.chart text { fill: var(--muted); font-size: 11px; font-family: inherit; }
svg.chart .axis line, svg.chart .axis path { stroke: var(--line); }
svg.chart .grid line { stroke: var(--faint); }
svg.chart text.mark { fill: var(--fg); font-weight: 600; paint-order: stroke; stroke: var(--bg); stroke-width: 3px; stroke-linejoin: round; }
svg.chart .s-base { stroke: var(--base); fill: none; }
svg.chart .s-head { stroke: var(--head); fill: none; }
svg.chart .s-fix { stroke: var(--fix); fill: none; }
svg.chart .s-budget { stroke: var(--budget); fill: none; }
svg.chart .dash { stroke-dasharray: 5 4; }
svg.chart .a-base { fill: var(--area-base); stroke: none; }
svg.chart .a-head { fill: var(--area-head); stroke: none; }
svg.chart .band { fill: var(--band); }
svg.chart .p-base { fill: var(--bg); stroke: var(--base); }
svg.chart .p-turning { fill: var(--turning); } svg.chart .p-unturned { fill: var(--unturned); } svg.chart .p-exposed { fill: var(--exposed); }
svg.chart .s-fix.dash { stroke-dasharray: 6 3; }
svg.chart .f-head { fill: var(--head); } svg.chart .f-base { fill: var(--base); } svg.chart .f-fix { fill: var(--fix); } svg.chart .f-block { fill: var(--block); }
.sw-base { background: var(--base); } .sw-head { background: var(--head); } .sw-turning { background: var(--turning); }
.sw-unturned { background: var(--unturned); } .sw-exposed { background: var(--exposed); } .sw-fix { background: var(--fix); }
.sw-budget { border-color: var(--budget) !important; } .sw-band { background: var(--band); border: 1px solid var(--unturned); }
.sw-a-head { background: var(--area-head); border: 1px solid var(--head); } .sw-a-base { background: var(--area-base); border: 1px solid var(--base); }
.findings { list-style: none; padding: 0; margin: 0; }
.finding { border: 1px solid var(--line); border-left: 4px solid var(--info); border-radius: 8px; padding: 10px 12px; margin: 0 0 10px; background: var(--bg); break-inside: avoid; }
.finding.block { border-left-color: var(--block); } .finding.warn { border-left-color: var(--warn); }
.finding .head { display: flex; flex-wrap: wrap; gap: 8px; align-items: baseline; }
.finding .where { color: var(--muted); font-size: 13px; }
.finding p { margin: 6px 0; }
.remedy { border: 1px solid var(--fix); border-radius: 8px; padding: 8px 10px; margin: 8px 0 0; background: var(--panel); }
.remedy.alt { border-style: dashed; }
.remedy.none { border-color: var(--line); }
.remedy .title { font-weight: 650; color: var(--fix); }
.remedy.none .title { color: var(--muted); }
.remedy .change { font-family: ui-monospace, SFMono-Regular, Menlo, Consolas, monospace; font-size: 13px; }
.remedy .after { font-weight: 700; color: var(--fix); }
.metrics { display: flex; flex-wrap: wrap; gap: 4px 12px; font-size: 13px; margin-top: 4px; color: var(--muted); }
.metrics b { color: var(--fg); font-weight: 600; }
table.deltas { border-collapse: collapse; width: 100%; font-size: 13px; margin-top: 8px; }
table.deltas th, table.deltas td { border-bottom: 1px solid var(--line); padding: 4px 8px; text-align: right; }
table.deltas th:first-child, table.deltas td:first-child { text-align: left; }
table.deltas tr.crossed td { color: var(--block); font-weight: 600; }
footer { color: var(--muted); font-size: 13px; margin-top: 24px; }
@media print {
  :root { color-scheme: light; --bg: #ffffff; --fg: #000000; --muted: #444c56; --faint: #eef1f4; --line: #c8d1da; --panel: #ffffff; }
  body { font-size: 11pt; }
  main { max-width: none; padding: 0; }
  .file { break-before: page; border: none; padding: 0; }
  .file:first-of-type { break-before: auto; }
  .charts { grid-template-columns: 1fr 1fr; }
  :root { --base: #8c959f; --head: #0969da; --turning: #0969da; --unturned: #bf8700; --exposed: #cf222e; --block: #cf222e; --warn: #9a6700; --ok: #1a7f37; --fix: #1a7f37; --budget: #cf222e; }
  figure, .finding, .card, .banner { break-inside: avoid; }
  a { color: inherit; text-decoration: none; }
}
`;
