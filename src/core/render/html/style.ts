/**
 * The report page's one style sheet, a look of its own: warm paper and ink with a teal for the
 * head, an ochre for warnings and a vermilion for what blocks; a serif for headings over a system
 * sans, on a 1.25 type scale (13 · 15 · 18 · 22 · 28 px); square tags and cards under a heavy top
 * rule. Severity is a shape as well as a colour (■ blocks, ▲ warning, ● note, ✓ passes), so the
 * page prints in grey. System fonts only (nothing is fetched); colours are custom properties
 * switched by `prefers-color-scheme`, and print uses the light ones on white paper.
 */
export const REPORT_CSS = `
:root {
  color-scheme: light dark;
  --bg: #fbfaf6; --fg: #1c1b19; --muted: #5e5b55; --faint: #efebe2; --line: #d8d2c6; --panel: #f4f1e9; --rule: #1c1b19;
  --base: #8a857b; --head: #0e6b6b; --turning: #0e6b6b; --unturned: #a86a00; --exposed: #b42a1c;
  --block: #b42a1c; --warn: #9a6200; --info: #34509a; --ok: #3f6f1f; --fix: #3f6f1f; --assumed: #6b4fa0;
  --budget: #b42a1c; --band: rgba(168, 106, 0, 0.10); --area-base: rgba(138, 133, 123, 0.26); --area-head: rgba(14, 107, 107, 0.20);
}
@media (prefers-color-scheme: dark) {
  :root {
    --bg: #171614; --fg: #ece7dc; --muted: #a8a296; --faint: #24221e; --line: #3a372f; --panel: #1f1d1a; --rule: #ece7dc;
    --base: #a49e92; --head: #52b9b3; --turning: #52b9b3; --unturned: #e0a53c; --exposed: #ff8b78;
    --block: #ff8b78; --warn: #e0a53c; --info: #9db0ff; --ok: #a3c97a; --fix: #a3c97a; --assumed: #c6a8ff;
    --budget: #ff8b78; --band: rgba(224, 165, 60, 0.13); --area-base: rgba(164, 158, 146, 0.26); --area-head: rgba(82, 185, 179, 0.24);
  }
}
* { box-sizing: border-box; }
html { border-top: 8px solid var(--rule); }
body { margin: 0; background: var(--bg); color: var(--fg); font: 15px/1.55 system-ui, -apple-system, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif; font-variant-numeric: tabular-nums; }
main { max-width: 1200px; margin: 0 auto; padding: 28px 24px 56px; }
h1, h2 { font-family: "Iowan Old Style", "Palatino Linotype", Palatino, "Book Antiqua", Georgia, serif; font-weight: 600; letter-spacing: -0.01em; }
h1 { font-size: 28px; line-height: 1.2; margin: 0 0 4px; }
h2 { font-size: 22px; margin: 0; word-break: break-all; }
h3 { font-size: 15px; margin: 22px 0 8px; font-weight: 650; border-bottom: 1px solid var(--line); padding-bottom: 3px; }
code, .mono, pre { font-family: ui-monospace, "SF Mono", Menlo, Consolas, "Liberation Mono", monospace; font-size: 0.9em; }
code { background: var(--faint); padding: 0 3px; word-break: break-all; }
pre { background: var(--faint); border-left: 3px solid var(--fix); padding: 8px 10px; margin: 6px 0; overflow-x: auto; white-space: pre-wrap; word-break: break-all; }
.muted { color: var(--muted); }
.banner { display: flex; flex-wrap: wrap; align-items: baseline; gap: 8px 20px; padding: 12px 0 14px; border-bottom: 3px double var(--line); margin: 10px 0 20px; }
.verdict { font-size: 22px; font-weight: 700; }
.verdict::before, .chip::before, .mark::before { font-weight: 700; margin-right: 0.35em; }
.verdict.block, .chip.block { color: var(--block); } .verdict.warn, .chip.warn { color: var(--warn); } .verdict.ok, .chip.ok { color: var(--ok); } .chip.info { color: var(--info); }
.verdict.block::before, .chip.block::before { content: "■"; }
.verdict.warn::before, .chip.warn::before { content: "▲"; }
.chip.info::before { content: "●"; }
.verdict.ok::before, .chip.ok::before { content: "✓"; }
.notes { margin: 0 0 18px; padding-left: 18px; color: var(--muted); }
.file { border-top: 2px solid var(--rule); padding: 14px 0 8px; margin: 0 0 34px; }
.file > header { display: flex; flex-wrap: wrap; align-items: baseline; gap: 10px 14px; margin-bottom: 12px; }
.chip { display: inline-block; padding: 0 7px; font-size: 13px; font-weight: 650; border: 1.5px solid currentColor; border-radius: 0; white-space: nowrap; background: var(--bg); }
.tag { display: inline-block; padding: 0 5px; font-size: 12px; border: 1px solid var(--line); color: var(--muted); }
.assumed { color: var(--assumed); font-style: italic; }
.assumed::after { content: " (assumed)"; font-size: 0.85em; }
.caution { font-size: 13px; color: var(--muted); border-left: 3px solid var(--warn); padding-left: 8px; margin: 4px 0; }
.caution b { color: var(--fg); }
.cards { display: grid; grid-template-columns: repeat(auto-fill, minmax(200px, 1fr)); gap: 0; margin: 0 0 18px; padding: 0; list-style: none; border-left: 1px solid var(--line); }
.card { border: 1px solid var(--line); border-left: none; padding: 10px 12px; background: var(--panel); border-top: 4px solid var(--line); }
.card.bad { border-top-color: var(--block); } .card.good { border-top-color: var(--ok); } .card.warn { border-top-color: var(--warn); }
.card.bad .label::before { content: "■ "; color: var(--block); } .card.warn .label::before { content: "▲ "; color: var(--warn); } .card.good .label::before { content: "✓ "; color: var(--ok); }
.card .label { font-size: 13px; color: var(--muted); }
.card .value { font-size: 18px; font-weight: 650; margin-top: 2px; }
.card .value .from { color: var(--muted); font-weight: 500; }
.card .note { font-size: 13px; color: var(--muted); }
.charts { display: grid; grid-template-columns: repeat(auto-fit, minmax(470px, 1fr)); gap: 18px; }
figure { margin: 0; border-top: 1px solid var(--line); padding: 8px 0 6px; background: var(--bg); break-inside: avoid; }
figcaption { font-size: 13px; color: var(--muted); margin-top: 4px; }
figure.wide { grid-column: 1 / -1; }
figure h3 { margin: 2px 0 4px; border: none; }
.legend { display: flex; flex-wrap: wrap; gap: 4px 14px; font-size: 13px; color: var(--muted); margin: 0 0 2px; padding: 0; list-style: none; }
.legend i { display: inline-block; width: 14px; height: 10px; margin-right: 5px; vertical-align: middle; }
.legend i.dash { height: 0; border-top: 2px dashed; background: none !important; }
.legend i.dash.sw-fix { border-color: var(--fix); } .legend i.dash.sw-head { border-color: var(--head); } .legend i.dash.sw-base { border-color: var(--base); }
.fix { display: flex; flex-wrap: wrap; gap: 6px 12px; align-items: baseline; border: 1.5px solid var(--fix); padding: 10px 14px; margin: 0 0 18px; background: var(--panel); }
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
svg.chart .s-span { stroke: var(--muted); fill: none; }
svg.chart .dash { stroke-dasharray: 5 4; }
svg.chart .dot { stroke-dasharray: 1 3; }
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
.finding { border: 1px solid var(--line); border-left: 5px solid var(--info); padding: 10px 12px; margin: 0 0 10px; background: var(--bg); break-inside: avoid; }
.finding.block { border-left-color: var(--block); } .finding.warn { border-left-color: var(--warn); border-left-style: double; border-left-width: 6px; }
.finding .head { display: flex; flex-wrap: wrap; gap: 8px; align-items: baseline; }
.finding .where { color: var(--muted); font-size: 13px; }
.finding p { margin: 6px 0; }
.remedy { border: 1px solid var(--fix); padding: 8px 10px; margin: 8px 0 0; background: var(--panel); }
.remedy.alt { border-style: dashed; }
.remedy.none { border-color: var(--line); }
.remedy .title { font-weight: 650; color: var(--fix); }
.remedy .title::before { content: "✓ "; }
.remedy.none .title { color: var(--muted); }
.remedy.none .title::before { content: "— "; }
.remedy .change { font-family: ui-monospace, "SF Mono", Menlo, Consolas, monospace; font-size: 13px; }
.remedy .after { font-weight: 700; color: var(--fix); }
.metrics { display: flex; flex-wrap: wrap; gap: 4px 12px; font-size: 13px; margin-top: 4px; color: var(--muted); }
.metrics b { color: var(--fg); font-weight: 600; }
table.deltas { border-collapse: collapse; width: 100%; font-size: 13px; margin-top: 8px; }
table.deltas th { font-weight: 650; border-bottom: 2px solid var(--rule); }
table.deltas th, table.deltas td { border-bottom: 1px solid var(--line); padding: 4px 8px; text-align: right; }
table.deltas th:first-child, table.deltas td:first-child, table.deltas td.state, table.deltas th.state { text-align: left; }
table.deltas tr.crossed.block td { color: var(--block); font-weight: 600; }
table.deltas tr.crossed.warn td { color: var(--warn); font-weight: 600; }
footer { color: var(--muted); font-size: 13px; margin-top: 28px; border-top: 1px solid var(--line); }
@media print {
  :root { color-scheme: light; --bg: #ffffff; --fg: #000000; --muted: #444444; --faint: #eeeeee; --line: #bbbbbb; --panel: #ffffff; --rule: #000000; }
  html { border-top-width: 4px; }
  body { font-size: 11pt; }
  main { max-width: none; padding: 0; }
  .file { break-before: page; }
  .file:first-of-type { break-before: auto; }
  .charts { grid-template-columns: 1fr 1fr; }
  :root { --base: #8a857b; --head: #0e6b6b; --turning: #0e6b6b; --unturned: #a86a00; --exposed: #b42a1c; --block: #b42a1c; --warn: #9a6200; --ok: #3f6f1f; --fix: #3f6f1f; --budget: #b42a1c; --assumed: #6b4fa0; }
  figure, .finding, .card, .banner { break-inside: avoid; }
  a { color: inherit; text-decoration: none; }
}
`;
