namespace BinEnergy.Reporting.Tables;

/// <summary>Which figures an estimate can have, so outputs show what applies and keep the rest in the data only.</summary>
/// <param name="Plant">Energy bought, cost and carbon were computed.</param>
/// <param name="Recovery">An energy recovery device was modelled.</param>
/// <param name="Humidification">A minimum indoor humidity was set.</param>
/// <param name="Fans">Fan energy was charged.</param>
public readonly record struct FigureSet(bool Plant, bool Recovery, bool Humidification, bool Fans)
{
    /// <summary>What one outdoor-air result can have.</summary>
    public static FigureSet Of(Core.Loads.OutdoorAirResult result) => new(
        result.HasPlant,
        result.Assumptions.Recovery is not null,
        result.Assumptions.MinRelativeHumidity is not null,
        result.Annual.Hourly.Loads.FanEnergy.Joules > 0);

    /// <summary>Every figure any of <paramref name="sets"/> has.</summary>
    public static FigureSet Any(IEnumerable<FigureSet> sets) =>
        sets.Aggregate(default(FigureSet), (a, b) => new(a.Plant || b.Plant, a.Recovery || b.Recovery, a.Humidification || b.Humidification, a.Fans || b.Fans));
}
