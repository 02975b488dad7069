using System.Text.Json;
using BinEnergy.Core.Units;
using BinEnergy.Reporting.Output;
using BinEnergy.Reporting.Tables;
using BinEnergy.Reporting.Units;
using BinEnergy.Tests.Cli;
using Spectre.Console;

namespace BinEnergy.Tests.Output;

/// <summary>One result model rendered every way: the same document as a terminal table, TSV, Markdown and JSON.</summary>
public class ResultDocumentTests
{
    private static ResultDocument Sample()
    {
        var u = new DisplayUnits(UnitSystem.IP);
        var doc = new ResultDocument("Sample \u001b[31mred\u001b[0m site");
        doc.Add(new ColumnSet<string>()
            .Text("site", "Site", s => s)
            .Number("airflow", u.Airflow, "Airflow", _ => VolumeFlow.FromCfm(1000).CubicMetresPerSecond)
            .Fill(new ResultTable(JsonRenderer.FactsTable) { Layout = TableLayout.Record }, ["Harbor"]));
        doc.Add(new ColumnSet<(string Method, double Joules)>()
            .Text("method", "Method", x => x.Method)
            .Number("heating", u.Energy, "Heating", x => x.Joules)
            .Number("spare", u.Energy, "Spare", _ => double.NaN, detail: true)
            .Fill(new ResultTable("annual") { Title = "By method", Layout = TableLayout.Keyed, KeyColumn = "method", Transpose = true },
                [("hourly", Energy.FromKbtu(12_345.6).Joules), ("joint-bin", Energy.FromKbtu(12_000).Joules)]));
        doc.Note(NoteKind.Warning, "look at this");
        doc.Note(NoteKind.Caution, "estimates only");
        return doc;
    }

    [Fact]
    public void Json_MergesFacts_KeysRowsByTheirKey_AndCarriesUnitsInNames()
    {
        using var json = JsonDocument.Parse(JsonRenderer.Render(Sample()));
        var root = json.RootElement;
        Assert.Equal("Harbor", root.GetProperty("site").GetString());
        Assert.Equal(1000, root.GetProperty("airflow_cfm").GetDouble(), 9);
        Assert.Equal(12_345.6, root.GetProperty("annual").GetProperty("hourly").GetProperty("heating_kbtu").GetDouble(), 9);
        Assert.True(root.GetProperty("annual").TryGetProperty("joint_bin", out var joint));
        Assert.Equal(JsonValueKind.Null, joint.GetProperty("spare_kbtu").ValueKind); // not a number: null, kept in the data
        Assert.Equal("look at this", root.GetProperty("warnings")[0].GetString());
        Assert.Equal("estimates only", root.GetProperty("cautions")[0].GetString());
    }

    [Fact]
    public void Tsv_PastesIntoASpreadsheet_NumbersWithoutSeparators_ControlCharactersEscaped()
    {
        var text = new StringWriter();
        TextRenderer.Render(Sample(), TextFormat.Tsv, AnsiConsole.Create(new AnsiConsoleSettings { Out = new AnsiConsoleOutput(new StringWriter()) }), text);
        var lines = text.ToString().Split('\n');
        Assert.Contains("# Sample \\x1B[31mred\\x1B[0m site", lines);
        Assert.Contains("Figure\thourly\tjoint-bin", lines);
        Assert.Contains("Heating, kBtu\t12346\t12000", lines); // N0 rounding, no thousands separator
        Assert.Contains("Airflow, cfm\t1000", lines); // a record's unit beside its item, so the value pastes as a number
        Assert.DoesNotContain(lines, l => l.Contains('│') || l.Contains('─') || l.Contains('╭')); // no box-drawing
        Assert.DoesNotContain(lines, l => l.Contains("Spare", StringComparison.Ordinal)); // detail columns stay in the data
        Assert.Contains("# Warning: look at this", lines);
        Assert.DoesNotContain('\u001b', text.ToString());
    }

    [Fact]
    public void Markdown_WritesPipeTablesWithNumbersRightAligned()
    {
        var text = new StringWriter();
        TextRenderer.Render(Sample(), TextFormat.Markdown, AnsiConsole.Create(new AnsiConsoleSettings { Out = new AnsiConsoleOutput(new StringWriter()) }), text);
        string md = text.ToString();
        Assert.Contains("### By method", md, StringComparison.Ordinal);
        Assert.Contains("| Figure | hourly | joint-bin |", md, StringComparison.Ordinal);
        Assert.Contains("|:---|---:|---:|", md, StringComparison.Ordinal);
        Assert.Contains("| Heating, kBtu | 12,346 | 12,000 |", md, StringComparison.Ordinal);
    }

    [Fact]
    public void Terminal_ShowsTheRecordAsItemsAndValues()
    {
        var writer = new StringWriter();
        var console = AnsiConsole.Create(new AnsiConsoleSettings { Out = new AnsiConsoleOutput(writer), Ansi = AnsiSupport.No, ColorSystem = ColorSystemSupport.NoColors });
        TextRenderer.Render(Sample(), TextFormat.Table, console, writer);
        string shown = writer.ToString();
        Assert.Contains("1,000 cfm", shown, StringComparison.Ordinal);
        Assert.Contains("12,346", shown, StringComparison.Ordinal);
        Assert.Contains("Caution: estimates only", shown, StringComparison.Ordinal);
        Assert.DoesNotContain('\u001b', shown);
    }

    [Fact]
    public void OutdoorAir_SameFiguresInEveryFormat()
    {
        string[] args = ["outdoor-air", BinsCommandTests.InventedFile(), "--airflow", "1000", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60"];
        var (code, json, err) = AirCommandTests.Run([.. args, "--json"]);
        Assert.True(code == 0, err);
        using var doc = JsonDocument.Parse(json);
        double heating = doc.RootElement.GetProperty("annual").GetProperty("hourly").GetProperty("heating_kbtu").GetDouble();
        var (code2, tsv, err2) = AirCommandTests.Run([.. args, "--format", "tsv"]);
        Assert.True(code2 == 0, err2);
        var row = tsv.Split('\n').Single(l => l.StartsWith("Heating\tkBtu\t", StringComparison.Ordinal)).Split('\t');
        Assert.Equal(Math.Round(heating), double.Parse(row[2], System.Globalization.CultureInfo.InvariantCulture));
        var (code3, csv, _) = AirCommandTests.Run([.. args, "--csv"]);
        Assert.Equal(0, code3);
        var header = csv.Split('\n')[0].Split(',');
        Assert.Contains("bin_heating_kbtu", header);
        Assert.Contains("hourly_heating_kbtu", header);
        Assert.Contains("joint_bin_cooling_latent_kbtu", header);
    }

    [Fact]
    public void OutdoorAir_BinHeadline_IsNamedAndWarnedAbout()
    {
        var (code, json, err) = AirCommandTests.Run("outdoor-air", Weather.TestData.Open("725300TYA.CSV"), "--map", "tmy3", "--airflow", "1000",
            "--heat-to", "70", "--cool-to", "75", "--max-rh", "60", "--headline", "bin", "--json");
        Assert.True(code == 0, err);
        using var doc = JsonDocument.Parse(json);
        Assert.Equal("bin", doc.RootElement.GetProperty("headline_method").GetString());
        Assert.Contains(doc.RootElement.GetProperty("warnings").EnumerateArray(), w => w.GetString()!.Contains("latent cooling by the bin method", StringComparison.Ordinal));
        Assert.Contains("latent cooling by the bin method", err, StringComparison.Ordinal); // a person sees it on standard error too
    }

    [Theory]
    [InlineData("--heat-to", "21", "--heat-to: 21 F is out of range")] // 21 F is -6 C: a setpoint plausible only in C
    [InlineData("--max-rh", "0", "--max-rh: 0 is out of range")]
    [InlineData("--headline", "best", "--headline: \"best\" is not one of \"hourly\", \"joint-bin\", \"bin\"")]
    public void OutdoorAir_OptionErrorsNameTheOptionAndTheUnitWritten(string option, string value, string message)
    {
        var args = new List<string> { "outdoor-air", BinsCommandTests.InventedFile(), "--airflow", "1000", "--heat-to", "70", "--cool-to", "75", "--max-rh", "60" };
        int i = args.IndexOf(option);
        if (i >= 0)
        {
            args[i + 1] = value;
        }
        else
        {
            args.AddRange([option, value]);
        }

        var (code, output, err) = AirCommandTests.Run([.. args]);
        Assert.Equal(2, code);
        Assert.Equal("", output);
        Assert.Contains(message, err, StringComparison.Ordinal);
    }
}
