using BinEnergy.Core.Economizer;
using BinEnergy.Core.Loads;

namespace BinEnergy.Core.Study;

/// <summary>
/// Says when a bin-method headline misleads (DESIGN 15): when the headline is a bin method and an
/// annual figure that is at least <see cref="ShareOfTotal"/> of the total differs from the hourly
/// sum by more than <see cref="Tolerance"/>, a warning names the figure and both numbers.
/// </summary>
public static class HeadlineCheck
{
    /// <summary>A figure smaller than this share of the thermal total is not checked (1 %).</summary>
    public const double ShareOfTotal = 0.01;

    /// <summary>The relative difference from hourly beyond which a warning is given (5 %).</summary>
    public const double Tolerance = 0.05;

    private static readonly (LoadFigure Figure, string Name)[] Checked =
    [
        (LoadFigure.Heating, "heating"),
        (LoadFigure.CoolingSensible, "sensible cooling"),
        (LoadFigure.CoolingLatent, "latent cooling"),
        (LoadFigure.Humidification, "humidification"),
    ];

    /// <summary>The warnings for one case's results under <paramref name="headline"/> (none for the hourly headline).</summary>
    public static IEnumerable<string> Warnings(OutdoorAirResult result, EconomizerEvaluation? economizer, IntegrationMethod headline)
    {
        if (headline == IntegrationMethod.Hourly)
        {
            yield break;
        }

        string method = IntegrationMethods.Label(headline);
        var hourly = result.Annual.Hourly;
        var estimate = result.Annual[headline];
        double total = hourly.Loads.ThermalTotal.Joules;
        foreach (var (figure, name) in Checked)
        {
            double h = hourly.Loads[figure].Joules, e = estimate.Loads[figure].Joules;
            if (h >= ShareOfTotal * total && Math.Abs(e - h) > Tolerance * Math.Abs(h))
            {
                yield return FormattableString.Invariant(
                    $"The headline {name} by the {method} is {(e - h) / h * 100:+0.0;-0.0} % from the hourly sum ({e / 3.6e6:N0} against {h / 3.6e6:N0} kWh): quote the hourly figure, or say which method you used.");
            }
        }

        double hc = hourly.Bought.Total.Cost, ec = estimate.Bought.Total.Cost;
        if (result.HasPlant && hc > 0 && Math.Abs(ec - hc) > Tolerance * hc)
        {
            yield return FormattableString.Invariant(
                $"The headline cost by the {method} is {(ec - hc) / hc * 100:+0.0;-0.0} % from the hourly sum ({ec:N0} against {hc:N0}).");
        }

        foreach (var control in economizer?.Controls ?? [])
        {
            double hs = control.Savings(IntegrationMethod.Hourly).Joules, es = control.Savings(headline).Joules;
            double baseline = control.Baseline.Hourly.CoilTotal.Joules;
            if (Math.Abs(hs) >= ShareOfTotal * baseline && Math.Abs(es - hs) > Tolerance * Math.Abs(hs) || (hs * es < 0 && Math.Abs(es - hs) > ShareOfTotal * baseline))
            {
                yield return FormattableString.Invariant(
                    $"The economizer savings of {control.Control.Describe()} by the {method} are {es / 3.6e6:N0} kWh of coil energy against {hs / 3.6e6:N0} kWh hour by hour: quote the hourly figure.");
            }
        }
    }
}
