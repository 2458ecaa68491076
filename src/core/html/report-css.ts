// The report's one style sheet. Colours are custom properties with a light and a dark set chosen by
// prefers-color-scheme; under forced colours (Windows high contrast) everything falls back to system
// colours (CSS Color 4 system colour keywords: Canvas, CanvasText, GrayText, Highlight).
export const REPORT_CSS = `
:root {
  color-scheme: light dark;
  --paper: #fbfaf6; --ink: #1f2226; --quiet: #5a6069; --rule: #d8d3c8; --band: #f1eee6;
  --bar: #2d6e66; --bar-edge: #1d4a44; --label: #7a4b12;
}
@media (prefers-color-scheme: dark) {
  :root { --paper: #16181b; --ink: #e6e2d9; --quiet: #a3a9b1; --rule: #3a3d42; --band: #202327;
    --bar: #77bdb1; --bar-edge: #a9dcd2; --label: #e2b173; }
}
* { box-sizing: border-box; }
body { margin: 0; background: var(--paper); color: var(--ink);
  font: 15px/1.5 system-ui, -apple-system, "Segoe UI", Roboto, "Noto Sans", sans-serif; }
header, main { max-width: 72rem; margin: 0 auto; padding: 0 1.25rem; }
header { padding-top: 1.5rem; border-bottom: 3px double var(--rule); }
h1 { font-size: 1.6rem; margin: 0 0 .25rem; overflow-wrap: anywhere; }
h2 { font-size: 1.25rem; margin: 2.25rem 0 .75rem; padding-bottom: .2rem; border-bottom: 1px solid var(--rule); }
h3 { font-size: 1.05rem; margin: 1.75rem 0 .5rem; overflow-wrap: anywhere; }
.lede { color: var(--quiet); margin: 0 0 .75rem; }
nav ol { display: flex; flex-wrap: wrap; gap: .25rem 1rem; list-style: none; padding: 0; margin: 0 0 1rem; }
a { color: inherit; text-underline-offset: .2em; }
figure { margin: 1rem 0 1.5rem; }
figcaption { margin-bottom: .4rem; overflow-wrap: anywhere; }
figcaption .method { color: var(--quiet); }
.scroll { overflow-x: auto; }
table { border-collapse: collapse; font-variant-numeric: tabular-nums; }
th, td { padding: .2rem .65rem; border-bottom: 1px solid var(--rule); text-align: left; vertical-align: top;
  max-width: 28rem; overflow-wrap: break-word; }
thead th { border-bottom: 2px solid var(--ink); font-weight: 600; white-space: nowrap; }
tbody tr:nth-child(even) { background: var(--band); }
.num { text-align: right; }
.center { text-align: center; }
.label { color: var(--label); font-style: italic; }
tfoot td { border-top: 2px solid var(--ink); border-bottom: none; font-weight: 600; }
.note { color: var(--quiet); margin: .4rem 0 0; }
.chart { display: block; width: 100%; max-width: 40rem; height: auto; }
.chart .bar { fill: var(--bar); }
.chart .touching { stroke: var(--bar-edge); stroke-width: .6; }
.chart .grid { stroke: var(--rule); stroke-width: 1; }
.chart .axis { stroke: var(--ink); stroke-width: 1; }
.chart text { fill: var(--quiet); font-size: 11px; }
.chart .label { fill: var(--label); }
ul.items { padding-left: 1.2rem; }
ul.items li { margin: .3rem 0; }
.cautions { border-left: 4px solid var(--label); padding: .25rem 0 .25rem 1rem; }
@media (forced-colors: active) {
  .chart .bar { fill: CanvasText; }
  .chart .touching { stroke: Canvas; }
  .chart text { fill: CanvasText; }
  .label, .note, .lede, figcaption .method { color: CanvasText; }
}
@media print {
  body { background: #fff; color: #000; }
  nav { display: none; }
  figure, tr { break-inside: avoid; }
}
`;
