package org.convgrid.plotting.report;

/** The report's inline style sheet: system fonts, readable tables, images scaled to the page width. */
final class ReportStyle {

    static final String CSS = """
            body { font-family: system-ui, sans-serif; max-width: 1240px; margin: 1.5em auto; padding: 0 1em;
                   color: #191919; line-height: 1.4; }
            h1 { font-size: 1.6em; } h2 { font-size: 1.25em; margin-top: 1.8em; border-bottom: 1px solid #ccc; }
            table { border-collapse: collapse; margin: 0.5em 0; font-size: 0.92em; }
            th, td { border: 1px solid #ccc; padding: 0.25em 0.6em; text-align: left; vertical-align: top; }
            th { background: #f2f2f2; }
            td.num { text-align: right; font-variant-numeric: tabular-nums; }
            table.facts th { width: 14em; }
            figure { margin: 1em 0 2em 0; }
            figure img { max-width: 100%; height: auto; border: 1px solid #ddd; }
            figcaption { font-size: 0.92em; color: #444; }
            pre { background: #f7f7f7; padding: 0.6em; overflow-x: auto; }
            .missing { color: #8a4b00; }
            .unrefined { color: #5c3200; background: #fff1d6; border: 2px solid #c77800; padding: 0.6em 0.9em;
                          font-weight: bold; }
            .unfinished { color: #5c3200; background: #fff1d6; border: 2px solid #c77800; padding: 0.6em 0.9em;
                          font-weight: bold; }
            h3 { font-size: 1.05em; margin-top: 1.4em; }
            nav ul.groups { display: inline; padding-left: 0.6em; }
            nav ul.groups li { display: inline; margin-right: 0.8em; }
            """;

    private ReportStyle() {
    }
}
