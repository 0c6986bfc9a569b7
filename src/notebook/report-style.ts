/**
 * The report's stylesheet: a quiet page at reading width, serif-free, with coppice's own colours (moss green for
 * what holds, rust for what fails, ochre for what to watch).
 */
export const REPORT_STYLE = `
:root { --ink: #22201c; --muted: #6b655b; --line: #ddd7cc; --paper: #fffdf9; --panel: #f6f3ec;
  --ok: #2f6b45; --warn: #9a6b12; --bad: #b3452c; }
* { box-sizing: border-box; }
body { margin: 0; background: var(--paper); color: var(--ink); font: 15px/1.55 system-ui, -apple-system, "Segoe UI", sans-serif; }
main { max-width: 920px; margin: 0 auto; padding: 24px 28px 64px; }
h1 { font-size: 26px; margin: 8px 0 4px; } h2 { font-size: 20px; margin: 32px 0 10px; border-bottom: 1px solid var(--line); padding-bottom: 4px; }
h3 { font-size: 16px; margin: 20px 0 6px; }
code, pre { font-family: ui-monospace, "SFMono-Regular", Menlo, Consolas, monospace; font-size: 13px; }
pre { background: var(--panel); padding: 8px 10px; border-radius: 4px; overflow-x: auto; white-space: pre-wrap; }
.muted { color: var(--muted); }
.badge { display: inline-block; padding: 0 7px; border-radius: 9px; font-size: 12px; font-weight: 600; color: #fff; }
.badge.ok { background: var(--ok); } .badge.warn { background: var(--warn); } .badge.bad { background: var(--bad); }
.error { color: var(--bad); font-weight: 600; } pre.error { background: #fbeae5; }
pre.stderr { background: #fbf3e3; }
table.data, .markdown table, .html-output table { border-collapse: collapse; margin: 6px 0 12px; font-size: 13px; }
table.data th, table.data td, .markdown th, .markdown td { border-bottom: 1px solid var(--line); padding: 3px 10px 3px 0; text-align: left; vertical-align: top; }
.html-output th, .html-output td { padding: 2px 10px 2px 0; border-bottom: 1px solid var(--line); vertical-align: top; }
.cell { margin: 10px 0 18px; }
.cell summary { cursor: pointer; color: var(--muted); font-size: 13px; }
.cell summary code { color: var(--muted); }
.cell .count { font-family: ui-monospace, monospace; }
.outputs { margin-top: 6px; }
.chart { margin: 8px 0; min-height: 40px; }
img.figure { max-width: 100%; }
.cautions { border: 1px solid #e2c9a0; background: #fdf6e8; border-radius: 6px; padding: 4px 18px 8px; margin: 18px 0; }
.cautions h2 { border: 0; margin: 10px 0 4px; font-size: 17px; }
.comparison { background: #fbfaf7; }
`;
