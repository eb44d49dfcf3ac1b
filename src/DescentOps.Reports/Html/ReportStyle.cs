namespace DescentOps.Reports.Html;

/// <summary>
/// The report's one style sheet, inline so the file needs nothing else. The SVGs name DejaVu Sans (the face
/// their glyphs were placed with); viewers without it fall back to a similar sans-serif.
/// </summary>
public static class ReportStyle
{
    public const string Css = """
        :root { color-scheme: light; }
        body { font-family: "DejaVu Sans", Verdana, "Segoe UI", Arial, sans-serif; color: #1f2328; background: #fbfbf8; margin: 0 auto; max-width: 940px; padding: 1.2em 1.4em 3em; line-height: 1.45; }
        h1 { font-size: 1.5em; margin: 0.2em 0 0.1em; }
        h2 { font-size: 1.15em; border-bottom: 1px solid #c9c9c0; padding-bottom: 0.2em; margin-top: 2em; }
        .run { color: #555; margin: 0; }
        .verdict { font-size: 1.2em; font-weight: bold; padding: 0.5em 0.8em; border-left: 6px solid #777; background: #f0f0ea; }
        .verdict.completed { border-left-color: #2a7f62; }
        .verdict.not-completed { border-left-color: #c05a12; }
        .verdict.unknown { border-left-color: #d9342b; }
        .truncated { border: 2px solid #d9342b; background: #fdecea; padding: 0.6em 1em; margin: 1em 0; }
        .truncated h2 { margin-top: 0.2em; border: 0; color: #9b1c14; }
        table { border-collapse: collapse; width: 100%; font-size: 0.9em; }
        th, td { text-align: left; vertical-align: top; padding: 0.25em 0.6em; border-bottom: 1px solid #e1e1da; }
        th { background: #ecece5; }
        table.figures th { width: 16em; background: transparent; font-weight: normal; color: #444; }
        td.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
        td.data { font-family: "DejaVu Sans Mono", Menlo, Consolas, monospace; font-size: 0.85em; word-break: break-word; }
        tr.sev-warning td.sev { color: #9a5b00; font-weight: bold; }
        tr.sev-alarm td.sev, tr.sev-critical td.sev { color: #b3261e; font-weight: bold; }
        figure { margin: 1.2em 0; }
        figure svg { max-width: 100%; height: auto; border: 1px solid #e1e1da; background: white; }
        figure svg text { font-family: "DejaVu Sans", Verdana, Arial, sans-serif; }
        figcaption, .note { color: #555; font-size: 0.85em; }
        .skipped { color: #555; font-style: italic; }
        dl { display: grid; grid-template-columns: 12em 1fr; gap: 0.2em 1em; font-size: 0.9em; }
        dt { color: #444; }
        dd { margin: 0; word-break: break-all; }
        pre { background: #f0f0ea; padding: 0.6em; overflow-x: auto; font-size: 0.8em; }
        #cautions p { font-size: 0.9em; }
        footer { margin-top: 3em; color: #777; font-size: 0.8em; }
        """;
}
