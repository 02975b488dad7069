using System.Globalization;
using System.Net;
using System.Text;
using System.Text.RegularExpressions;
using BinEnergy.Reporting.Charts;
using BinEnergy.Reporting.Text;

namespace BinEnergy.Reporting.Html;

/// <summary>
/// Builds the report page: one self-contained HTML5 document (inline CSS, charts as PNG data
/// URIs, no scripts, nothing fetched from a network) with the sections, in order, "What was
/// run" (id <c>run</c>), "Assumptions" (<c>assumptions</c>), "Results" (<c>results</c>),
/// "Warnings" (<c>warnings</c>) and "Cautions" (<c>cautions</c>). Every piece of text from the
/// model is HTML-escaped.
/// </summary>
public static partial class HtmlReport
{
    /// <summary>The ids of the fixed sections, in page order.</summary>
    public static IReadOnlyList<string> SectionIds { get; } = ["run", "inputs", "assumptions", "results", "warnings", "cautions"];

    /// <summary>A table wider than this many columns is printed in parts of at most this many, its leading text columns repeated in each.</summary>
    public const int PrintColumns = 11;

    private static readonly string[] SectionTitles = ["What was run", "Inputs", "Assumptions", "Results", "Warnings", "Cautions"];

    /// <summary>The page as a string.</summary>
    public static string Build(ReportModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        var page = new StringBuilder(64 * 1024);
        string name = E(model.StudyName);
        page.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
            .Append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
            .Append("<meta name=\"generator\" content=\"BinEnergy ").Append(E(model.Run.EngineVersion)).Append("\">\n")
            .Append("<title>").Append(name).Append(" — BinEnergy outdoor-air report</title>\n")
            .Append("<style>\n").Append(Css).Append("</style>\n</head>\n<body>\n");

        page.Append("<header>\n<p class=\"kicker\">BinEnergy outdoor-air report</p>\n<h1>").Append(name).Append("</h1>\n")
            .Append("<p class=\"meta\">Run ").Append(E(FormatTime(model.Run.RunAt)))
            .Append(" · BinEnergy ").Append(E(model.Run.EngineVersion))
            .Append(" · study hash <code>").Append(E(model.Run.StudyHash)).Append("</code></p>\n")
            .Append("<p class=\"banner\" role=\"note\"><strong>Caution.</strong> ").Append(E(Cautions.Banner)).Append("</p>\n")
            .Append("<nav aria-label=\"Contents\"><ol>");
        for (int i = 0; i < SectionIds.Count; i++)
        {
            page.Append("<li><a href=\"#").Append(SectionIds[i]).Append("\">").Append(SectionTitles[i]).Append("</a></li>");
        }

        page.Append("</ol></nav>\n</header>\n<main>\n");

        Open(page, 0);
        var run = new List<ReportKeyValue>
        {
            new("Study", model.StudyName),
            new("Study hash", model.Run.StudyHash),
            new("Engine version", "BinEnergy " + model.Run.EngineVersion),
            new("Run at", FormatTime(model.Run.RunAt)),
        };
        run.AddRange(model.Run.Inputs);
        KeyValues(page, run);
        Close(page);

        Sections(page, 1, model.Inputs, "The inputs are listed under What was run.");

        Open(page, 2);
        var a = model.Assumptions;
        var assumptions = new List<ReportKeyValue>
        {
            new("Flow basis", a.FlowBasis),
            new("Air density", a.AirDensity),
            new("Sensible factor", $"{a.SiteSensibleFactor} at the site; {a.StandardSensibleFactor}"),
            new("Bins", a.BinWidth),
            new("Calendar", a.Calendar),
            new("Schedule", a.Schedule),
            new("Data repairs", a.DataRepairs.Count == 0 ? "none" : string.Join("; ", a.DataRepairs)),
        };
        assumptions.AddRange(a.Other);
        KeyValues(page, assumptions);
        Close(page);

        Sections(page, 3, model.Results, "No results.");

        Open(page, 4);
        if (model.Warnings.Count == 0)
        {
            page.Append("<p>No warnings.</p>\n");
        }
        else
        {
            Items(page, model.Warnings, "warnings");
        }

        Close(page);

        Open(page, 5);
        Items(page, Cautions.Report.Concat(model.ExtraCautions).ToArray(), "cautions");
        Close(page);

        page.Append("</main>\n<footer><p>Made by BinEnergy ").Append(E(model.Run.EngineVersion))
            .Append(". This page is self-contained: charts are embedded and nothing is loaded from a network.</p></footer>\n")
            .Append("</body>\n</html>\n");
        return page.ToString();
    }

    /// <summary>Writes the page to <paramref name="path"/> (UTF-8) under a temporary name, then moves it into place.</summary>
    public static void Write(ReportModel model, string path)
    {
        string? folder = Path.GetDirectoryName(Path.GetFullPath(path));
        if (folder is not null)
        {
            Directory.CreateDirectory(folder);
        }

        AtomicFile.Write(path, new UTF8Encoding(false).GetBytes(Build(model)));
    }

    /// <summary>HTML-escapes text for element content and attribute values (&lt; &gt; &amp; " ').</summary>
    public static string Escape(string? text) => WebUtility.HtmlEncode(text ?? "");

    private static string E(string? text) => Escape(text);

    private static string FormatTime(DateTimeOffset t) => t.ToString("yyyy-MM-dd HH:mm 'UTC'zzz", CultureInfo.InvariantCulture);

    private static void Open(StringBuilder page, int index) =>
        page.Append("<section id=\"").Append(SectionIds[index]).Append("\">\n<h2>").Append(SectionTitles[index]).Append("</h2>\n");

    private static void Sections(StringBuilder page, int index, IReadOnlyList<ReportSection> sections, string whenNone)
    {
        Open(page, index);
        if (sections.Count == 0)
        {
            page.Append("<p>").Append(E(whenNone)).Append("</p>\n");
        }

        foreach (var section in sections)
        {
            Section(page, section, 3);
        }

        Close(page);
    }

    private static void Close(StringBuilder page) => page.Append("</section>\n");

    private static void Section(StringBuilder page, ReportSection section, int level)
    {
        int h = Math.Min(level, 6);
        bool chartOnly = section.Subsections.Count == 0 && section.Blocks.Count == 1 && section.Blocks[0] is ReportChart;
        page.Append(chartOnly ? "<section class=\"result chart\">\n<h" : "<section class=\"result\">\n<h").Append(h).Append('>').Append(E(section.Heading)).Append("</h").Append(h).Append(">\n");
        foreach (var block in section.Blocks)
        {
            Block(page, block);
        }

        foreach (var sub in section.Subsections)
        {
            Section(page, sub, level + 1);
        }

        page.Append("</section>\n");
    }

    private static void Block(StringBuilder page, ReportBlock block)
    {
        switch (block)
        {
            case ReportParagraph p:
                page.Append("<p>").Append(E(p.Text).Replace("\n", "<br>", StringComparison.Ordinal)).Append("</p>\n");
                break;
            case ReportKeyValueList list:
                KeyValues(page, list.Items);
                break;
            case ReportTable table:
                Table(page, table);
                break;
            case ReportChart chart:
                Figure(page, chart);
                break;
            default:
                throw new ArgumentException($"the report cannot show a block of type {block.GetType().Name}");
        }
    }

    private static void KeyValues(StringBuilder page, IReadOnlyList<ReportKeyValue> items)
    {
        page.Append("<dl class=\"pairs\">\n");
        foreach (var item in items)
        {
            page.Append("<dt>").Append(E(item.Key)).Append("</dt><dd>").Append(E(item.Value)).Append("</dd>\n");
        }

        page.Append("</dl>\n");
    }

    private static void Items(StringBuilder page, IReadOnlyList<string> items, string cssClass)
    {
        page.Append("<ul class=\"").Append(cssClass).Append("\">\n");
        foreach (var item in items)
        {
            page.Append("<li>").Append(E(item)).Append("</li>\n");
        }

        page.Append("</ul>\n");
    }

    private static void Table(StringBuilder page, ReportTable table)
    {
        for (int r = 0; r < table.Rows.Count; r++)
        {
            if (table.Rows[r].Count != table.Headers.Count)
            {
                throw new ArgumentException($"table '{table.Caption}' row {r + 1} has {table.Rows[r].Count} cells but the table has {table.Headers.Count} columns");
            }
        }

        var parts = PrintParts(table);
        if (parts.Count == 1)
        {
            TableHtml(page, table, parts[0], "table-wrap", table.Caption);
            return;
        }

        // On screen the whole table (scrolling sideways when it must); on paper the same table in parts that fit the page.
        TableHtml(page, table, [.. Enumerable.Range(0, table.Headers.Count)], "table-wrap screen-only", table.Caption);
        for (int p = 0; p < parts.Count; p++)
        {
            TableHtml(page, table, parts[p], "table-wrap print-only", $"{table.Caption} (part {p + 1} of {parts.Count})");
        }
    }

    /// <summary>
    /// The columns of each printed part of a table: the whole table when it has at most <see cref="PrintColumns"/>
    /// columns; else its leading text columns (up to three: climate, variant, ...) and as many of the rest as fit.
    /// </summary>
    public static IReadOnlyList<IReadOnlyList<int>> PrintParts(ReportTable table)
    {
        ArgumentNullException.ThrowIfNull(table);
        int n = table.Headers.Count;
        if (n <= PrintColumns)
        {
            return [Enumerable.Range(0, n).ToList()];
        }

        int keys = 0;
        while (keys < Math.Min(3, n - 1) && table.Rows.All(r => !Numeric().IsMatch(r[keys])))
        {
            keys++;
        }

        keys = Math.Max(keys, 1);
        int room = PrintColumns - keys;
        var rest = Enumerable.Range(keys, n - keys).ToList();
        int count = (rest.Count + room - 1) / room;
        int size = (rest.Count + count - 1) / count;
        return rest.Chunk(size).Select(chunk => (IReadOnlyList<int>)[.. Enumerable.Range(0, keys), .. chunk]).ToList();
    }

    private static void TableHtml(StringBuilder page, ReportTable table, IReadOnlyList<int> columns, string wrapClass, string caption)
    {
        page.Append("<div class=\"").Append(wrapClass).Append("\"><table>\n<caption>").Append(E(caption)).Append("</caption>\n<thead><tr>");
        foreach (int c in columns)
        {
            page.Append("<th scope=\"col\">").Append(E(table.Headers[c])).Append("</th>");
        }

        page.Append("</tr></thead>\n<tbody>\n");
        foreach (var row in table.Rows)
        {
            page.Append("<tr>");
            for (int i = 0; i < columns.Count; i++)
            {
                string cell = row[columns[i]];
                page.Append(i == 0 ? "<th scope=\"row\"" : "<td").Append(Numeric().IsMatch(cell) ? " class=\"num\">" : ">")
                    .Append(E(cell)).Append(i == 0 ? "</th>" : "</td>");
            }

            page.Append("</tr>\n");
        }

        page.Append("</tbody>\n</table></div>\n");
    }

    private static void Figure(StringBuilder page, ReportChart block)
    {
        RenderedChart chart = block.Chart;
        page.Append("<figure class=\"chart\" data-chart=\"").Append(E(chart.FileStem)).Append("\">\n<img src=\"")
            .Append(chart.PngDataUri).Append("\" width=\"").Append(chart.Size.Width.ToString(CultureInfo.InvariantCulture))
            .Append("\" height=\"").Append(chart.Size.Height.ToString(CultureInfo.InvariantCulture))
            .Append("\" alt=\"").Append(E(chart.Description)).Append("\">\n<figcaption>")
            .Append(E(block.Caption ?? chart.Title)).Append("</figcaption>\n</figure>\n");
    }

    [GeneratedRegex(@"^[-+]?[\d,]*\.?\d+( ?%)?$", RegexOptions.CultureInvariant)]
    private static partial Regex Numeric();

    private const string Css = """
        :root { --ink: #1a1a1a; --navy: #1d3557; --rule: #c9c9c9; --pale: #eef4fa; --sand: #f7efd9; --orange: #e08a2e; }
        * { box-sizing: border-box; }
        body { margin: 0 auto; max-width: 1180px; padding: 1.5rem 1.25rem 3rem; color: var(--ink);
               font: 16px/1.5 "DejaVu Sans", "Segoe UI", Helvetica, Arial, sans-serif; background: #fff; }
        header { border-bottom: 3px solid var(--navy); margin-bottom: 1.5rem; }
        .kicker { margin: 0; color: var(--navy); font-size: 0.85rem; letter-spacing: 0.08em; text-transform: uppercase; }
        h1 { margin: 0.2rem 0 0.4rem; font-size: 1.9rem; line-height: 1.2; overflow-wrap: anywhere; }
        h2 { margin-top: 2.2rem; padding-bottom: 0.2rem; border-bottom: 1px solid var(--rule); color: var(--navy); font-size: 1.4rem; }
        h3 { margin-top: 1.6rem; font-size: 1.15rem; }
        h4, h5, h6 { font-size: 1rem; }
        .meta { margin: 0 0 0.8rem; color: #444; font-size: 0.9rem; }
        code { font-family: "DejaVu Sans Mono", Consolas, monospace; font-size: 0.85em; overflow-wrap: anywhere; }
        .banner { margin: 0 0 1rem; padding: 0.6rem 0.9rem; background: var(--sand); border-left: 5px solid var(--orange); }
        nav ol { display: flex; flex-wrap: wrap; gap: 0.3rem 1.4rem; margin: 0 0 1rem; padding: 0; list-style: none; }
        nav a { color: var(--navy); }
        dl.pairs { display: grid; grid-template-columns: minmax(10rem, max-content) 1fr; gap: 0.3rem 1.2rem; margin: 0.8rem 0; }
        dl.pairs dt { font-weight: bold; }
        dl.pairs dd { margin: 0; overflow-wrap: anywhere; }
        .table-wrap { overflow-x: auto; margin: 1rem 0; }
        table { border-collapse: collapse; font-size: 0.9rem; min-width: 50%; }
        caption { text-align: left; font-weight: bold; padding-bottom: 0.3rem; }
        th, td { padding: 0.3rem 0.6rem; border-bottom: 1px solid var(--rule); text-align: left; vertical-align: top; }
        thead th { background: var(--pale); border-bottom: 2px solid var(--navy); }
        tbody tr:nth-child(even) { background: #fafafa; }
        .num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
        figure.chart { margin: 1.2rem 0; }
        figure.chart img { display: block; max-width: 100%; height: auto; border: 1px solid var(--rule); }
        figcaption { font-size: 0.9rem; color: #444; margin-top: 0.3rem; }
        ul.warnings li { margin-bottom: 0.3rem; }
        ul.warnings li::marker { color: var(--orange); }
        #cautions { background: var(--sand); padding: 0.2rem 1.2rem 0.8rem; border-left: 5px solid var(--orange); }
        #cautions h2 { border-bottom-color: var(--orange); }
        footer { margin-top: 2.5rem; border-top: 1px solid var(--rule); color: #555; font-size: 0.85rem; }
        .print-only { display: none; }
        @page { margin: 14mm 12mm 16mm; @bottom-right { content: "Page " counter(page) " of " counter(pages); font: 8pt "DejaVu Sans", sans-serif; color: #555; } }
        @media print {
          body { max-width: none; padding: 0; font-size: 9.5pt; }
          nav { display: none; }
          .screen-only { display: none; }
          .print-only { display: block; }
          h2 { margin-top: 1.2rem; break-before: auto; }
          h2, h3, h4, h5, h6, caption { break-after: avoid; }
          .table-wrap { overflow: visible; margin: 0.6rem 0; }
          table { width: 100%; font-size: 7.5pt; }
          th, td { padding: 0.15rem 0.3rem; }
          thead { display: table-header-group; }
          tr { break-inside: avoid; }
          section.chart { break-inside: avoid; }
          figure.chart { margin: 0.4rem 0; break-inside: avoid; }
          section.chart > :is(h3, h4, h5, h6) { display: none; }
          figure.chart img { max-height: 7.3cm; width: auto; max-width: 100%; }
          tbody th { white-space: nowrap; }
          #cautions { break-inside: avoid; }
        }

        """;
}
