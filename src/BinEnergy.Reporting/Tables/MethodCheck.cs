using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;
using BinEnergy.Reporting.Units;

namespace BinEnergy.Reporting.Tables;

/// <summary>
/// The method check (DESIGN 15): each annual figure by the hourly sum, joint bins and the bin
/// method, with each bin method's difference from the hourly sum in percent of it. The same rows
/// serve the terminal, the JSON, the report and the summary.
/// </summary>
public static class MethodCheck
{
    /// <summary>One figure by the three methods, in display units.</summary>
    /// <param name="Figure">The figure's name, e.g. "Cooling, latent".</param>
    /// <param name="Unit">Its unit symbol.</param>
    /// <param name="Values">Its value by each method, in that unit.</param>
    public sealed record Row(string Figure, string Unit, ByMethod<double> Values)
    {
        /// <summary>A method's difference from hourly, percent of hourly; NaN when there is none.</summary>
        public double DifferencePercent(IntegrationMethod method) =>
            MethodDifference.Percent(Values[method], Values.Hourly, 1e-9) ?? double.NaN;
    }

    /// <summary>The rows of an outdoor-air result (energy figures that apply, then cost and carbon with a plant) and of its economizer's savings.</summary>
    public static List<Row> Rows(OutdoorAirResult result, EconomizerEvaluation? economizer, DisplayUnits u)
    {
        var show = FigureSet.Of(result);
        var rows = new List<Row>();
        foreach (var figure in Enum.GetValues<LoadFigure>())
        {
            bool applies = figure switch
            {
                LoadFigure.Humidification => show.Humidification,
                LoadFigure.RecoveredHeating or LoadFigure.RecoveredCooling => show.Recovery,
                LoadFigure.FanEnergy => show.Fans,
                _ => true,
            };
            if (applies)
            {
                var (_, label, unit) = FigureColumns.Of(figure, u);
                rows.Add(new Row(label, unit.Symbol, result.Annual.Select(f => unit.FromSi(f.Loads[figure].Joules))));
            }
        }

        if (show.Plant)
        {
            rows.Add(new Row("Cost", u.Cost.Symbol, result.Annual.Select(f => f.Bought.Total.Cost)));
            rows.Add(new Row("Carbon", u.Carbon.Symbol, result.Annual.Select(f => f.Bought.Total.CarbonKg)));
        }

        foreach (var c in economizer?.Controls ?? [])
        {
            var s = new ByMethod<double>(c.Savings(IntegrationMethod.Hourly).Joules, c.Savings(IntegrationMethod.JointBin).Joules, c.Savings(IntegrationMethod.Bin).Joules);
            rows.Add(new Row("Economizer savings, " + c.Control.Describe(), u.Energy.Symbol, s.Select(u.Energy.FromSi)));
        }

        return rows;
    }

    /// <summary>The columns of a method-check row.</summary>
    public static ColumnSet<Row> Columns(DisplayUnits u) => new ColumnSet<Row>()
        .Text("figure", "Figure", r => r.Figure)
        .Text("unit", "Unit", r => r.Unit)
        .Number("hourly", DisplayUnit.Count, "Hourly", r => r.Values.Hourly)
        .Number("joint_bin", DisplayUnit.Count, "Joint bins", r => r.Values.JointBin)
        .Number("bin", DisplayUnit.Count, "Bin method", r => r.Values.Bin)
        .Number("joint_bin_difference", u.Percent, "Joint bins vs hourly", r => r.DifferencePercent(IntegrationMethod.JointBin))
        .Number("bin_difference", u.Percent, "Bin method vs hourly", r => r.DifferencePercent(IntegrationMethod.Bin));
}
