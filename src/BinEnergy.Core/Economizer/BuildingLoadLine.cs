using BinEnergy.Core.Units;

namespace BinEnergy.Core.Economizer;

/// <summary>
/// The building's sensible cooling load as a straight line of outdoor dry-bulb, the load line
/// of the modified bin method (ASHRAE Handbook—Fundamentals, chapter on energy estimating and
/// modeling methods (chapter 19 in the 2017 edition, recalled from memory), "modified bin method"; DESIGN 8):
/// Q_b(T_o) = Q_design (T_o - T_bal) / (T_design - T_bal) for T_o &gt; T_bal, else 0.
/// Above the design temperature the line is extended, not capped.
/// </summary>
/// <param name="DesignLoad">Sensible cooling load at the design outdoor temperature.</param>
/// <param name="DesignOutdoor">The design outdoor dry-bulb.</param>
/// <param name="BalancePoint">The outdoor dry-bulb at which the building needs no cooling.</param>
public sealed record BuildingLoadLine(Power DesignLoad, Temperature DesignOutdoor, Temperature BalancePoint)
{
    /// <summary>Load per kelvin above the balance point, W/K.</summary>
    public double SlopeWPerK => DesignLoad.Watts / (DesignOutdoor.Celsius - BalancePoint.Celsius);

    /// <summary>The sensible cooling load in W at an outdoor dry-bulb in C (0 at or below the balance point).</summary>
    public double LoadWatts(double outdoorDryBulbC) =>
        outdoorDryBulbC > BalancePoint.Celsius ? SlopeWPerK * (outdoorDryBulbC - BalancePoint.Celsius) : 0.0;

    /// <summary>Problems with the line, each naming its key; empty when valid.</summary>
    public IEnumerable<EconomizerSettingsProblem> Problems()
    {
        if (!(DesignLoad.Watts > 0) || !double.IsFinite(DesignLoad.Watts))
        {
            yield return new("design_load", "the design sensible cooling load must be above zero");
        }

        if (!(DesignOutdoor.Celsius > BalancePoint.Celsius))
        {
            yield return new("design_outdoor", "the design outdoor temperature must be above the balance point (the load line rises from zero at the balance point to the design load)");
        }
    }
}
