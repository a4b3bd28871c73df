namespace PartForge.Export.Report;

/// <summary>The report's own stylesheet, inlined into every report (no external fonts or files).</summary>
public static class ReportStyle
{
    public const string Css = """
:root { --paper:#f7f5ef; --card:#fffefb; --ink:#23303b; --soft:#5d6b76; --rule:#d9d4c7; --accent:#2f6f68;
        --dim:#b0532a; --gap:#c2262e; --pass:#2f7d46; --warn:#b77a00; --fail:#b3261e; }
* { box-sizing: border-box; }
body { margin:0; background:var(--paper); color:var(--ink); font: 15px/1.45 "DejaVu Sans", "Liberation Sans", sans-serif; }
header.masthead { background:var(--ink); color:#f4efe2; padding:22px 36px 18px; border-bottom:6px solid var(--accent); }
header.masthead h1 { margin:0; font-size:26px; letter-spacing:0.02em; }
header.masthead p { margin:6px 0 0; color:#c9c2b0; }
.banner-failed { background:var(--fail); color:#fff; font-weight:bold; font-size:20px; padding:14px 36px; letter-spacing:0.04em; }
main { max-width:1120px; margin:0 auto; padding:18px 28px 60px; }
section { background:var(--card); border:1px solid var(--rule); border-radius:6px; margin:18px 0; padding:14px 22px 18px; }
section h2 { margin:0 0 10px; font-size:19px; color:var(--accent); border-bottom:2px solid var(--rule); padding-bottom:6px; }
section h3 { font-size:16px; margin:16px 0 6px; }
table { border-collapse:collapse; width:100%; margin:6px 0 10px; font-size:13.5px; }
th { text-align:left; background:#ece7da; color:var(--ink); font-weight:600; padding:5px 8px; border-bottom:2px solid var(--rule); }
td { padding:4px 8px; border-bottom:1px solid #ebe6da; vertical-align:top; }
#summary-table th, #electrical-table th { width:55%; }
td.num { text-align:right; font-variant-numeric: tabular-nums; white-space:nowrap; }
.grid2 { display:grid; grid-template-columns: 1fr 1fr; gap:0 28px; }
.pill { display:inline-block; min-width:44px; text-align:center; border-radius:10px; padding:1px 8px; color:#fff; font-size:12px; font-weight:bold; }
.pill.pass { background:var(--pass); } .pill.warn { background:var(--warn); } .pill.fail { background:var(--fail); }
.status-line { font-size:16px; margin:4px 0 10px; }
.cautions li { margin:6px 0; } .cautions b { color:var(--fail); }
.note { color:var(--soft); font-size:13px; }
figure { margin:10px 0 18px; } #pf-view { width:100%; max-width:960px; display:block; border:1px solid #ccc; cursor:grab; touch-action:none; } .view3d-controls label { margin-right:12px; font-size:14px; } #pf-parts { margin:6px 0; } figcaption { color:var(--soft); font-size:13px; margin-top:4px; }
svg { background:#fffdf8; border:1px solid var(--rule); max-width:100%; height:auto; }
svg text { font-family:"DejaVu Sans", sans-serif; }
.part-fill { fill:#dfe9e6; stroke:var(--ink); stroke-width:0.35; }
.blind { fill:#c9d9d5; stroke:var(--ink); stroke-width:0.25; stroke-dasharray:1.2 0.8; }
.mark { fill:none; stroke:var(--accent); stroke-width:0.35; }
.chain { fill:none; stroke:var(--soft); stroke-width:0.25; stroke-dasharray:4 1 0.6 1; }
.dim-line, .ext-line { stroke:var(--dim); stroke-width:0.22; fill:none; }
.ext-line { stroke-width:0.15; }
.dim-arrow, .dim-dot { fill:var(--dim); }
.leader { stroke:var(--dim); stroke-width:0.08; fill:none; } .gap-leader { stroke:var(--gap); stroke-width:0.1; fill:none; }
.dim-text { fill:var(--dim); }
.gap-line { stroke:var(--gap); stroke-width:0.25; } .gap-arrow { fill:var(--gap); }
.gap-text, .dim-text { paint-order:stroke; stroke:#fffdf8; stroke-width:0.5; stroke-linejoin:round; } .gap-text { fill:var(--gap); font-weight:bold; }
.caption { fill:var(--soft); }
.pole-badge-n { fill:#2c3e50; stroke:#fff; stroke-width:0.2; } .pole-badge-s { fill:#fff; stroke:#2c3e50; stroke-width:0.3; }
.pole-text-n { fill:#fff; font-weight:bold; } .pole-text-s { fill:#2c3e50; font-weight:bold; }
.axis-line { stroke:var(--soft); stroke-width:0.2; stroke-dasharray:3 0.8 0.6 0.8; }
.cut { stroke:var(--ink); stroke-width:0.12; }
.cut-rotor { fill:#9cc3bd; } .cut-magnet { fill:#b9473f; } .cut-back-iron { fill:#6d7278; } .cut-stator { fill:#d9c89b; }
.cut-former { fill:#efe3b8; } .cut-copper { fill:#c77d3a; } .cut-spacer { fill:#b8b2a3; }
.plot-frame { fill:#fffdf8; stroke:var(--ink); stroke-width:1; }
.plot-grid { stroke:#e6e0d2; stroke-width:0.8; } .plot-zero { stroke:#a9a291; stroke-width:1; }
.plot-tick { stroke:var(--ink); stroke-width:1; }
.plot-label { fill:var(--ink); } .plot-title { fill:var(--soft); } .plot-heading { fill:var(--ink); font-weight:bold; }
.plot-line { fill:none; stroke-width:2; } .plot-key { stroke:none; }
img.preview { max-width:100%; border:1px solid var(--rule); background:#f6f4ee; }
footer { color:var(--soft); font-size:12px; text-align:center; padding:20px; }
@media print { body { background:#fff; } section { break-inside:avoid; } }
""";
}
