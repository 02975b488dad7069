using BinEnergy.Core.Units;

namespace BinEnergy.Core.Loads;

/// <summary>Energy totals of an outdoor-air estimate over a set of hours (a year, a month, a bin).</summary>
public sealed record OutdoorAirTotals(
    Energy Heating,
    Energy CoolingSensible,
    Energy CoolingLatent,
    Energy Humidification,
    Energy RecoveredHeating,
    Energy RecoveredCooling,
    Energy FanEnergy,
    int HoursVentilated)
{
    /// <summary>Every figure, in the order outputs list them.</summary>
    public static IReadOnlyList<LoadFigure> Figures { get; } = Enum.GetValues<LoadFigure>();

    /// <summary>No energy, no hours.</summary>
    public static OutdoorAirTotals Zero { get; } = new(default, default, default, default, default, default, default, 0);

    /// <summary>Total cooling: sensible plus latent.</summary>
    public Energy Cooling => CoolingSensible + CoolingLatent;

    /// <summary>One figure.</summary>
    public Energy Get(LoadFigure figure) => figure switch
    {
        LoadFigure.Heating => Heating,
        LoadFigure.CoolingSensible => CoolingSensible,
        LoadFigure.CoolingLatent => CoolingLatent,
        LoadFigure.Humidification => Humidification,
        LoadFigure.RecoveredHeating => RecoveredHeating,
        LoadFigure.RecoveredCooling => RecoveredCooling,
        LoadFigure.FanEnergy => FanEnergy,
        _ => throw new ArgumentOutOfRangeException(nameof(figure), figure, "unknown figure"),
    };
}
