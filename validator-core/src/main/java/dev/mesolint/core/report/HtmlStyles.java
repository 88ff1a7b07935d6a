package dev.mesolint.core.report;

/**
 * The report's inline stylesheet. Colours come from a colour-blind-safe palette (Okabe and Ito), and every colour
 * has a pattern or a word beside it. Print rules drop the page background, keep the chart colours and avoid splitting
 * a chart across pages.
 */
final class HtmlStyles {
    private HtmlStyles() {
    }

    static final String CSS = """
            :root { --ink: #1b1f24; --muted: #4a5360; --rule: #c9ced6; --paper: #ffffff; --wash: #f3f5f8;
              --ok: #0072B2; --low: #E69F00; --high: #D55E00; --kept: #009E73; --lost: #B8BEC6; --time: #56B4E9;
              --info: #0072B2; --warn: #E69F00; --err: #D55E00; }
            * { box-sizing: border-box; }
            body { margin: 0; font: 15px/1.45 "DejaVu Sans", "Liberation Sans", Arial, sans-serif; color: var(--ink);
              background: var(--wash); }
            a { color: #0a4f8a; }
            a:focus-visible { outline: 3px solid var(--ink); outline-offset: 2px; }
            .masthead { background: #22303f; color: #fff; padding: 20px 28px 16px; }
            .masthead h1 { margin: 0 0 4px; font-size: 24px; letter-spacing: .02em; }
            .masthead a { color: #cfe6ff; }
            .masthead .path { color: #c3cfdb; }
            .masthead .verdict { display: inline-block; font-weight: bold; padding: 2px 10px; border: 2px solid #fff;
              border-radius: 3px; margin-right: 8px; }
            .masthead dl { display: flex; flex-wrap: wrap; gap: 4px 22px; margin: 10px 0 0; }
            .masthead dt { font-size: 12px; text-transform: uppercase; opacity: .8; }
            .masthead dd { margin: 0; }
            nav ol { margin: 10px 0 0; padding-left: 22px; }
            main { max-width: 1120px; margin: 0 auto; padding: 8px 20px 24px; }
            section.programme { background: var(--paper); border: 1px solid var(--rule); border-radius: 6px;
              margin: 22px 0; padding: 4px 24px 20px; }
            h2 { font-size: 21px; margin: 16px 0 2px; }
            h2 .path, .path { font: 13px "DejaVu Sans Mono", monospace; color: var(--muted); }
            h3 { font-size: 17px; margin: 22px 0 8px; border-bottom: 1px solid var(--rule); padding-bottom: 3px; }
            h4 { font-size: 15px; margin: 16px 0 6px; }
            .facts { display: grid; grid-template-columns: repeat(auto-fill, minmax(170px, 1fr)); gap: 6px 18px;
              margin: 12px 0; }
            .facts div { border-left: 3px solid var(--rule); padding-left: 8px; }
            .facts dt { font-size: 12px; color: var(--muted); text-transform: uppercase; }
            .facts dd { margin: 0; font-weight: bold; overflow-wrap: anywhere; }
            .counts { display: flex; flex-wrap: wrap; gap: 8px; padding: 0; list-style: none; }
            .counts li { border: 1px solid var(--rule); border-radius: 3px; padding: 2px 10px; background: var(--wash); }
            .badge { display: inline-block; min-width: 86px; font-size: 12px; font-weight: bold; text-transform: uppercase;
              padding: 1px 6px; border-radius: 3px; border: 2px solid; background: #fff; }
            .badge.error { border-color: var(--err); color: #8a2f00; }
            .badge.warning { border-color: var(--warn); color: #6b4a00; border-style: dashed; }
            .badge.info { border-color: var(--info); color: #07456b; border-style: dotted; }
            .badge.waived { border-color: var(--muted); color: var(--muted); border-style: double; border-width: 3px; }
            figure { margin: 18px 0; padding: 10px 12px; border: 1px solid var(--rule); border-radius: 4px;
              background: #fff; overflow-x: auto; }
            figcaption { font-weight: bold; margin-bottom: 6px; }
            figcaption p { font-weight: normal; color: var(--muted); margin: 2px 0 0; font-size: 13px; }
            svg.chart { display: block; max-width: 100%; height: auto; font-family: "DejaVu Sans", sans-serif; }
            svg.defs { position: absolute; width: 0; height: 0; overflow: hidden; }
            .legend { display: flex; flex-wrap: wrap; gap: 4px 18px; list-style: none; padding: 0; margin: 8px 0 0;
              font-size: 13px; }
            .legend svg { vertical-align: middle; margin-right: 5px; }
            .band { fill: #f1f4f8; }
            .grid { stroke: #e1e5ea; stroke-width: 1; }
            .tick, .small { font-size: 11px; fill: var(--muted); }
            .label { font-size: 12px; fill: var(--ink); }
            .strong { font-weight: bold; }
            .value { font-size: 11px; fill: var(--ink); paint-order: stroke; stroke: #fff; stroke-width: 3px;
              stroke-linejoin: round; }
            .bar-ok { fill: var(--ok); }
            .bar-low { fill: var(--low); }
            .bar-high { fill: var(--high); }
            .bar-kept { fill: var(--kept); }
            .bar-lost { fill: var(--lost); }
            .bar-time { fill: var(--time); }
            .pattern-ink { fill: rgba(0, 0, 0, .45); }
            .pattern-line { stroke: rgba(0, 0, 0, .55); stroke-width: 1.3; }
            .floor { stroke: var(--ink); stroke-width: 2; stroke-dasharray: 5 3; }
            .cap { stroke: var(--ink); stroke-width: 2.5; }
            .budget { stroke: var(--ink); stroke-width: 2; stroke-dasharray: 7 4; }
            .heat { stroke: #fff; stroke-width: 1; }
            .heat.out { stroke: var(--ink); stroke-width: 2.5; stroke-dasharray: 4 2; }
            .heat-0 { fill: #f7f9fb; } .heat-1 { fill: #deebf7; } .heat-2 { fill: #b3d3ea; }
            .heat-3 { fill: #6baed6; } .heat-4 { fill: #2f7fbf; } .heat-5 { fill: #08457e; }
            .cell-text { font-size: 12px; fill: var(--ink); font-weight: bold; }
            .cell-text.on-dark { fill: #fff; }
            .no-figures { color: var(--muted); font-style: italic; }
            ul.findings { list-style: none; padding: 0; margin: 0; }
            li.finding { border-left: 4px solid var(--rule); padding: 6px 10px; margin: 6px 0; background: var(--wash); }
            li.finding.error { border-left-color: var(--err); }
            li.finding.warning { border-left-color: var(--warn); border-left-style: dashed; }
            li.finding.info { border-left-color: var(--info); border-left-style: dotted; }
            li.finding.is-waived { opacity: .8; border-left-style: double; }
            .finding .head { display: flex; flex-wrap: wrap; gap: 4px 12px; align-items: baseline; }
            .finding .where, .finding .rule { font: 13px "DejaVu Sans Mono", monospace; }
            .finding p { margin: 3px 0 0; }
            .finding .fix::before { content: "Fix: "; font-weight: bold; }
            .finding .waiver::before { content: "Waived: "; font-weight: bold; }
            .clean { font-weight: bold; }
            footer { max-width: 1120px; margin: 0 auto 30px; padding: 14px 20px; border-top: 3px double var(--rule);
              color: var(--ink); }
            footer .caution { font-size: 14px; }
            .caution { border: 2px solid var(--ink); border-radius: 4px; padding: 8px 12px; background: #fff; }
            .how-to-read { background: #fff; border: 1px solid var(--rule); border-radius: 6px; margin: 18px 0;
              padding: 4px 20px 10px; }
            .how-to-read h2 { font-size: 17px; }
            .how-to-read dl { display: grid; grid-template-columns: repeat(auto-fill, minmax(300px, 1fr));
              gap: 6px 22px; margin: 6px 0; }
            .how-to-read dt { font-weight: bold; }
            .how-to-read dd { margin: 0; font-size: 14px; }
            nav { max-width: 1120px; margin: 0 auto; padding: 0 20px; }
            table { border-collapse: collapse; }
            table.index { width: 100%; margin: 16px 0 0; background: #fff; border: 1px solid var(--rule); }
            table.index caption { text-align: left; font-weight: bold; padding: 4px 0; }
            table.index th, table.index td { text-align: left; padding: 5px 10px; border-bottom: 1px solid var(--rule); }
            table.index td:nth-child(n+4) { text-align: right; white-space: nowrap; }
            button.sort { font: inherit; font-weight: bold; background: none; border: 0; padding: 0; cursor: pointer;
              color: var(--ink); text-decoration: underline dotted; }
            th[aria-sort="ascending"] button.sort::after { content: " ▴"; }
            th[aria-sort="descending"] button.sort::after { content: " ▾"; }
            .outcome { display: inline-block; font-weight: bold; font-size: 13px; padding: 0 7px; border-radius: 3px;
              border: 2px solid; white-space: nowrap; }
            .outcome.passes { color: #00573f; border-color: var(--kept); }
            .outcome.fails { color: #8a2f00; border-color: var(--err); border-style: dashed; }
            details > summary { cursor: pointer; list-style-position: outside; margin-left: 18px; }
            details > summary h2 { display: inline; }
            section.programme > details > summary { padding: 12px 0 6px; }
            .note, .week-note { color: var(--muted); font-size: 14px; margin: 4px 0 8px; }
            .tag { font-size: 12px; font-weight: bold; text-transform: uppercase; border: 1px solid var(--ink);
              border-radius: 3px; padding: 0 5px; vertical-align: middle; }
            table.plan { width: 100%; margin: 4px 0 14px; font-size: 14px; table-layout: fixed; }
            table.plan caption { text-align: left; font-weight: bold; padding: 4px 0; }
            table.plan th, table.plan td { text-align: left; vertical-align: top; padding: 4px 8px;
              border-bottom: 1px solid var(--rule); }
            table.plan thead th { font-size: 12px; text-transform: uppercase; color: var(--muted);
              border-bottom: 2px solid var(--ink); }
            table.plan tbody th { font-weight: normal; }
            table.plan .load strong { white-space: nowrap; }
            table.plan .detail { display: block; font-size: 12px; color: var(--muted); }
            tr.superset th { background: var(--wash); font-weight: bold; font-size: 13px; }
            tr.in-superset th { padding-left: 20px; }
            .item { font-weight: bold; font-family: "DejaVu Sans Mono", monospace; }
            td.changed { background: #fff6dd; }
            .delta { font-weight: bold; color: #6b4a00; }
            .down { font-weight: bold; }
            .none { color: var(--muted); }
            a.mark { display: inline-block; font: 12px "DejaVu Sans Mono", monospace; white-space: nowrap;
              margin: 0 4px 2px 0; }
            a.line { font: 12px "DejaVu Sans Mono", monospace; }
            table.maxes th, table.maxes td { padding: 3px 14px 3px 0; text-align: left; border-bottom: 1px solid var(--rule); }
            table.maxes caption { text-align: left; font-weight: bold; padding: 4px 0; }
            ul.constraints { padding-left: 20px; }
            ul.constraints p { margin: 2px 0; }
            .term { font-weight: bold; }
            .filter { display: flex; flex-wrap: wrap; gap: 6px 16px; align-items: center; margin: 6px 0 10px;
              font-size: 14px; }
            .filter .count { color: var(--muted); }
            .sr { position: absolute; width: 1px; height: 1px; overflow: hidden; clip: rect(0 0 0 0);
              white-space: nowrap; }
            .spread { stroke: var(--ink); stroke-width: 2; }
            .top-dot { fill: var(--ok); stroke: var(--ink); stroke-width: 1; }
            .mean-dot { fill: #fff; stroke: var(--ink); stroke-width: 2; }
            table.figures-table { margin: 6px 0 14px; font-size: 14px; }
            table.figures-table caption { text-align: left; font-weight: bold; padding: 4px 0; }
            table.figures-table th, table.figures-table td { text-align: left; padding: 3px 10px 3px 0;
              border-bottom: 1px solid var(--rule); vertical-align: top; }
            table.figures-table thead th { font-size: 12px; color: var(--muted); border-bottom: 2px solid var(--ink); }
            table.figures-table .detail { display: block; font-size: 11px; font-weight: normal; }
            td.out { font-weight: bold; background: #fff6dd; }
            .sheet-head { margin: 0 0 10px; }
            .sheet-head h1 { font-size: 22px; margin: 10px 0 2px; }
            @page { margin: 12mm 11mm; }
            @media print {
              body { background: #fff; font-size: 10.5pt; }
              .masthead { background: #fff; color: #000; border-bottom: 2px solid #000; padding: 0 0 8px; }
              .masthead a, .masthead .path { color: #000; }
              .masthead .verdict { border-color: #000; }
              nav, main, footer { max-width: none; padding: 0; }
              .filter, button.sort::after { display: none; }
              section.programme { border: 0; padding: 0; margin: 0; break-before: page; }
              section.programme:first-of-type { break-before: auto; }
              details > summary { list-style: none; margin-left: 0; }
              details > summary::-webkit-details-marker { display: none; }
              h1, h2, h3, h4, caption, figcaption, summary { break-after: avoid; }
              figure, li.finding, table.plan, table.maxes, table.figures-table, .how-to-read div, .caution, tr { break-inside: avoid; }
              table.index { font-size: 9.5pt; }
              table.index .path { font-size: 8pt; overflow-wrap: anywhere; }
              .keep { break-inside: avoid; }
              figure { border: 0; overflow: visible; padding: 0; margin: 10px 0; }
              svg.chart { max-height: 150mm; width: auto; max-width: 100%; }
              .how-to-read dl { grid-template-columns: 1fr 1fr; }
              table.plan { font-size: 9.5pt; }
              table.plan th, table.plan td { padding: 2px 5px; }
              body.sheet { line-height: 1.2; }
              body.sheet table.plan { font-size: 8.5pt; margin-bottom: 5px; }
              body.sheet table.plan th, body.sheet table.plan td { padding: 1px 4px; }
              body.sheet table.plan caption { padding: 2px 0 1px; }
              body.sheet table.plan .detail { display: inline; font-size: 7.5pt; }
              body.sheet .sheet-head h1 { font-size: 14pt; margin: 0; }
              body.sheet .caution { padding: 3px 6px; font-size: 8pt; margin: 4px 0; }
              body.sheet .note { font-size: 8pt; margin: 2px 0 3px; }
              body.sheet h4 { margin: 4px 0 1px; font-size: 11pt; }
              svg, .badge, li.finding, td.changed, .outcome { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
              a { color: #000; text-decoration: none; }
              .finding a.where::after { content: " (" attr(href) ")"; font-size: 8pt; }
              body.sheet section.week { break-before: page; }
              body.sheet section.week.first { break-before: auto; }
              body.sheet section.programme { break-before: page; }
              body.sheet section.programme.first { break-before: auto; }
            }
            """;
}
