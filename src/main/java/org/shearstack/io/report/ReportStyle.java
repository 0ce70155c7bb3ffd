package org.shearstack.io.report;

/** The report's own stylesheet, inlined into the page. */
final class ReportStyle {

    private ReportStyle() {
    }

    static final String CSS = """
            :root { --ink: #1f2a30; --muted: #5d6b73; --paper: #fbfaf7; --rule: #d9d4c7; --accent: #1d6f72;
              --pass: #2e7d4f; --caution: #b7791f; --fail: #b83227; --band: #9cc9c4; }
            * { box-sizing: border-box; }
            body { margin: 0; background: var(--paper); color: var(--ink);
              font: 15px/1.45 "DejaVu Sans", "Segoe UI", Helvetica, Arial, sans-serif; }
            main { max-width: 1180px; margin: 0 auto; padding: 0 24px 48px; }
            header#headline { display: flex; justify-content: space-between; align-items: center; gap: 24px;
              border-bottom: 4px solid var(--accent); padding: 22px 0 12px; }
            h1 { margin: 0; font-size: 30px; letter-spacing: 0.5px; }
            h2 { margin: 30px 0 10px; font-size: 21px; color: var(--accent); border-bottom: 1px solid var(--rule);
              padding-bottom: 4px; }
            h3 { margin: 18px 0 6px; font-size: 16px; }
            .sub { margin: 2px 0 0; color: var(--muted); }
            code { font-family: "DejaVu Sans Mono", Consolas, monospace; font-size: 13px; }
            .verdict { margin: 0; padding: 10px 22px; border-radius: 6px; color: #fff; font-size: 24px;
              font-weight: bold; text-transform: uppercase; letter-spacing: 2px; }
            .v-pass { background: var(--pass); } .v-caution { background: var(--caution); }
            .v-fail { background: var(--fail); }
            table { border-collapse: collapse; }
            table.figures { margin-top: 14px; min-width: 560px; }
            table.figures th { text-align: left; font-weight: normal; color: var(--muted); padding: 4px 18px 4px 0; }
            table.figures td { font-size: 18px; font-weight: bold; padding: 4px 0; }
            table.figures tr.first th { color: var(--ink); font-weight: bold; }
            table.figures tr.first td { font-size: 24px; color: var(--fail); }
            p.first { font-size: 18px; font-weight: bold; color: var(--fail); }
            dl.dims { display: flex; flex-wrap: wrap; gap: 8px 26px; margin: 0; }
            dl.dims dt { color: var(--muted); font-size: 13px; } dl.dims dd { margin: 0; font-weight: bold; }
            .omissions { margin-top: 18px; padding: 8px 16px; background: #f1eee6; border-left: 4px solid var(--muted); }
            .omissions h2 { border: 0; color: var(--ink); font-size: 16px; margin: 6px 0; }
            section.cautions { margin-top: 22px; padding: 6px 20px 10px; background: #fff4e0;
              border: 2px solid var(--caution); border-radius: 6px; }
            section.cautions h2 { color: #7a4e0d; border: 0; }
            .missing { color: var(--caution); font-weight: bold; }
            .note { color: var(--muted); font-style: italic; }
            .plots { display: grid; grid-template-columns: repeat(2, 560px); gap: 16px; }
            svg.plot { background: #fff; border: 1px solid var(--rule); }
            svg text { font: 12px "DejaVu Sans", Helvetica, Arial, sans-serif; fill: var(--ink); }
            svg .ptitle { font-weight: bold; font-size: 13px; }
            svg .grid { stroke: #ebe7dd; stroke-width: 1; } svg .axis { stroke: var(--ink); stroke-width: 1.2; }
            svg .tick { fill: var(--muted); font-size: 11px; }
            svg .line { fill: none; stroke-width: 2.2; } svg .est { stroke: var(--accent); }
            svg .gen { stroke: #7b4fa0; stroke-dasharray: 6 4; }
            svg .band { fill: var(--band); fill-opacity: 0.45; stroke: none; }
            svg .mark circle { fill: var(--fail); stroke: #fff; stroke-width: 1.5; }
            svg .markline { stroke: var(--fail); stroke-dasharray: 2 3; }
            svg .mark text { fill: var(--fail); font-weight: bold; }
            svg .legend text { font-size: 11px; }
            .part { border-top: 1px solid var(--rule); }
            .partbody { display: flex; gap: 20px; align-items: flex-start; flex-wrap: wrap; }
            .count { color: var(--muted); font-weight: normal; }
            svg.drawing { background: #fff; border: 1px solid var(--rule); }
            svg .plan { fill: #d6e6e4; stroke: var(--accent); stroke-width: 1; }
            svg .cut { fill: #7fa9a6; stroke: #23484a; stroke-width: 0.6; }
            svg .cutline { stroke: var(--fail); stroke-dasharray: 8 3 2 3; }
            svg .dimline { stroke: var(--ink); stroke-width: 0.8; } svg .dim { font-size: 11px; }
            svg .dlabel { fill: var(--muted); font-size: 11px; }
            table.facts { max-width: 440px; }
            table.facts th { text-align: left; color: var(--muted); font-weight: normal; padding: 2px 14px 2px 0; }
            details { border-bottom: 1px dotted var(--rule); padding: 2px 0; }
            details summary { cursor: pointer; } details dl { margin: 4px 0 8px 20px; }
            details dt { float: left; width: 70px; color: var(--muted); } details dd { margin-left: 80px; }
            ul.inputs { margin: 0; padding-left: 16px; }
            .origin { font-size: 11px; padding: 0 6px; border-radius: 8px; background: #e7e3d8; color: var(--muted); }
            .o-rule { background: #d6e6e4; color: #23484a; } .o-pinned { background: #f3dcc0; color: #7a4e0d; }
            table.findings, table.bom { width: 100%; font-size: 13px; margin-top: 8px; }
            table.findings th, table.bom th { text-align: left; background: #ece8de; padding: 5px 8px; }
            table.findings td, table.bom td { border-top: 1px solid var(--rule); padding: 5px 8px; vertical-align: top; }
            td.n { text-align: right; white-space: nowrap; }
            table.findings td code { white-space: nowrap; }
            .sev { display: inline-block; min-width: 62px; text-align: center; color: #fff; border-radius: 4px;
              padding: 1px 6px; font-weight: bold; text-transform: uppercase; font-size: 11px; }
            .sev.s-ok { background: var(--pass); } .sev.s-caution { background: var(--caution); }
            .sev.s-fail { background: var(--fail); }
            tr.s-fail td { background: #fbeceb; } tr.s-caution td { background: #fdf5e6; }
            .remedy { margin-top: 4px; color: #23484a; }
            figure.preview img { max-width: 100%; border: 1px solid var(--rule); }
            footer { margin-top: 40px; color: var(--muted); font-size: 12px; border-top: 1px solid var(--rule);
              padding-top: 8px; }
            """;
}
