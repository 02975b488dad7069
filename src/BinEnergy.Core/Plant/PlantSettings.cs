namespace BinEnergy.Core.Plant;

/// <summary>
/// The plant that meets the outdoor-air loads (DESIGN 9), in SI: the heating source and its
/// efficiency (or heat-pump COP curve), the cooling COP curve, the fan efficiency, and the
/// price and carbon factor of each fuel.
/// </summary>
/// <param name="Heating">What heats.</param>
/// <param name="HeatingEfficiency">Seasonal efficiency of a gas, oil or electric heater, in (0, 1.2]
/// (above 1 only for condensing boilers quoted on lower heating value; 1 for resistance).</param>
/// <param name="HeatPumpCop">COP versus outdoor temperature of a heat pump (null unless <see cref="HeatingSource.HeatPump"/>).</param>
/// <param name="CoolingCop">Cooling COP versus outdoor temperature (compressor and condenser fans).</param>
/// <param name="FanEfficiency">Total fan efficiency used for the fan energy from a pressure drop.</param>
/// <param name="HumidifierEfficiency">Electric humidifier: electricity per unit of humidification energy is 1 / this.</param>
/// <param name="Tariffs">Price and carbon factor per fuel; a fuel left out costs nothing and emits nothing.</param>
public sealed record PlantSettings(
    HeatingSource Heating,
    double HeatingEfficiency,
    PerformanceCurve? HeatPumpCop,
    PerformanceCurve CoolingCop,
    double FanEfficiency,
    double HumidifierEfficiency,
    IReadOnlyDictionary<Fuel, FuelTariff> Tariffs)
{
    /// <summary>Heat content of the oil, J per US gallon (default 138,500 Btu/gal, recalled from memory).</summary>
    public double OilJoulesPerGallon { get; init; } = FuelUnits.DefaultOilBtuPerGallon * Units.Conversions.JoulesPerBtu;

    /// <summary>
    /// Heat to raise steam from supply water, J/kg: about 2,630 kJ/kg, the enthalpy of saturated
    /// steam at 100 C (2,675.6 kJ/kg) less that of supply water at 10 C (42.0 kJ/kg), from the
    /// thermodynamic properties of water in ASHRAE Handbook—Fundamentals 2017 ch. 1, table 3
    /// (recalled from memory).
    /// </summary>
    public const double SteamJoulesPerKilogram = 2_630_000.0;

    /// <summary>
    /// Optional cooling COP against outdoor dry-bulb and coil-entering wet-bulb; where the coil's
    /// entering state is known (the economizer's mixed air) it replaces <see cref="CoolingCop"/>.
    /// </summary>
    public CoolingCopTable? CoolingCopByWetBulb { get; init; }

    /// <summary>The humidifier type (default steam-electric).</summary>
    public HumidifierType Humidifier { get; init; } = HumidifierType.SteamElectric;

    /// <summary>
    /// A heat pump's heating capacity against outdoor dry-bulb, W (held at the end values outside
    /// the points); null for a heat pump that carries any load.
    /// </summary>
    public PerformanceCurve? HeatPumpCapacity { get; init; }

    /// <summary>Outdoor dry-bulb below which the heat pump is locked out and the backup carries all the heating; null for none.</summary>
    public Units.Temperature? HeatPumpLockout { get; init; }

    /// <summary>The backup heat of a heat pump: electric resistance (default), gas or oil.</summary>
    public HeatingSource Backup { get; init; } = HeatingSource.Electric;

    /// <summary>Efficiency of the backup heat (default 1.0, electric resistance).</summary>
    public double BackupEfficiency { get; init; } = 1.0;

    /// <summary>Outdoor dry-bulb below which the heat pump defrosts; null for no defrost penalty.</summary>
    public Units.Temperature? DefrostBelow { get; init; }

    /// <summary>Fraction the COP loses below <see cref="DefrostBelow"/> (COP x (1 - penalty)).</summary>
    public double DefrostPenalty { get; init; }

    /// <summary>
    /// True when <paramref name="other"/> describes the same plant: every setting equal, the curves and tables by their
    /// points and the tariffs by fuel.
    /// </summary>
    public bool SamePlantAs(PlantSettings other)
    {
        ArgumentNullException.ThrowIfNull(other);
        return Tariffs.Count == other.Tariffs.Count
            && Tariffs.All(t => other.Tariffs.TryGetValue(t.Key, out var o) && o == t.Value)
            && this with { Tariffs = other.Tariffs } == other;
    }

    /// <summary>The fuel the backup heat buys.</summary>
    public Fuel BackupFuel => Backup switch
    {
        HeatingSource.Gas => Fuel.Gas,
        HeatingSource.Oil => Fuel.Oil,
        _ => Fuel.Electricity,
    };

    /// <summary>The fuel the heating source buys.</summary>
    public Fuel HeatingFuel => Heating switch
    {
        HeatingSource.Gas => Fuel.Gas,
        HeatingSource.Oil => Fuel.Oil,
        _ => Fuel.Electricity,
    };

    /// <summary>The tariff of a fuel, or <see cref="FuelTariff.Free"/> when the study gives none.</summary>
    public FuelTariff TariffOf(Fuel fuel) => Tariffs.TryGetValue(fuel, out var t) ? t : FuelTariff.Free;
}
