using System.Globalization;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// One moist-air state as a person gives it, in one unit system: a dry-bulb, exactly one humidity measure
/// (wet-bulb, dew point, relative humidity in percent, or humidity ratio), and the elevation or the total pressure.
/// <see cref="Resolve"/> checks that the inputs describe a physical state and builds it (handbook ch. 1 relations,
/// through <see cref="AirState"/>; the standard atmosphere for the pressure at an elevation).
/// </summary>
/// <param name="Units">The unit system of every number.</param>
/// <param name="DryBulb">Dry-bulb temperature (F or C).</param>
public sealed record AirStateInput(UnitSystem Units, double DryBulb)
{
    /// <summary>Lowest elevation accepted, ft.</summary>
    public const double MinElevationFt = -1_000;

    /// <summary>Highest elevation accepted, ft (the standard atmosphere's troposphere ends near 36,089 ft).</summary>
    public const double MaxElevationFt = 36_000;

    public double? WetBulb { get; init; }

    public double? DewPoint { get; init; }

    /// <summary>Relative humidity, percent.</summary>
    public double? RelativeHumidityPct { get; init; }

    /// <summary>Humidity ratio, lb/lb or kg/kg (the same number).</summary>
    public double? HumidityRatio { get; init; }

    /// <summary>Site elevation (ft or m); sea level when neither it nor <see cref="Pressure"/> is given.</summary>
    public double? Elevation { get; init; }

    /// <summary>Total (station) pressure (psia or kPa), instead of <see cref="Elevation"/>.</summary>
    public double? Pressure { get; init; }

    /// <summary>The state, and where its pressure came from ("given", or the standard atmosphere at an elevation).</summary>
    /// <exception cref="PsychrometricException">The inputs are missing a measure, give two, or describe no physical state.</exception>
    public (AirState State, string PressureSource) Resolve()
    {
        int measures = new[] { WetBulb, DewPoint, RelativeHumidityPct, HumidityRatio }.Count(v => v.HasValue);
        string? problem = measures switch
        {
            0 => "give one humidity measure: wet-bulb, dew point, relative humidity or humidity ratio",
            > 1 => $"give only one humidity measure: wet-bulb, dew point, relative humidity or humidity ratio (got {measures})",
            _ when Elevation.HasValue && Pressure.HasValue => "give the elevation or the pressure, not both",
            _ when RelativeHumidityPct is double rh && !(rh >= 0 && rh <= 100) => Inv($"relative humidity {rh} is outside 0 to 100 percent"),
            _ when DewPoint > DryBulb => Inv($"dew point {DewPoint} is above the dry-bulb {DryBulb}: air cannot hold more water than at saturation"),
            _ when WetBulb > DryBulb => Inv($"wet-bulb {WetBulb} is above the dry-bulb {DryBulb}: the wet-bulb can never exceed the dry-bulb"),
            _ when HumidityRatio is double w && !(w >= 0 && w < 1) => Inv($"humidity ratio {w} must be between 0 and 1 (lb/lb or kg/kg; 0.010 is typical)"),
            _ => null,
        };
        if (problem is not null)
        {
            throw new PsychrometricException(nameof(AirStateInput), null, problem);
        }

        var (pressure, source) = SitePressure();
        var dryBulb = Temperature.From(DryBulb, Units);
        var state = (RelativeHumidityPct, DewPoint, WetBulb) switch
        {
            (double rh, _, _) => AirState.FromRelativeHumidity(dryBulb, rh / 100.0, pressure),
            (_, double dp, _) => AirState.FromDewPoint(dryBulb, Temperature.From(dp, Units), pressure),
            (_, _, double wb) => AirState.FromWetBulb(dryBulb, Temperature.From(wb, Units), pressure),
            _ => AirState.FromHumidityRatio(dryBulb, Core.Units.HumidityRatio.FromKilogramsPerKilogram(HumidityRatio!.Value), pressure),
        };
        return (state, source);
    }

    private (Core.Units.Pressure Pressure, string Source) SitePressure()
    {
        if (Pressure is double p)
        {
            var given = Core.Units.Pressure.From(p, Units);
            return given.Kilopascals is >= 30 and <= 120 ? (given, "given")
                : throw new PsychrometricException(nameof(Pressure), p, Inv($"pressure {p} is outside 30 to 120 kPa (4.4 to 17.4 psia)"));
        }

        var elevation = Length.From(Elevation ?? 0.0, Units);
        if (!(elevation.Feet >= MinElevationFt - 1e-9 && elevation.Feet <= MaxElevationFt + 1e-9))
        {
            throw new PsychrometricException(nameof(Elevation), Elevation, Inv($"elevation {Elevation} is outside -1,000 to 36,000 ft (-305 to 10,973 m)"));
        }

        string source = Elevation.HasValue ? Inv($"standard atmosphere at {elevation.Metres:#,0.#} m ({elevation.Feet:#,0} ft)") : "standard atmosphere at sea level";
        return (Atmosphere.PressureAt(elevation), source);
    }

    private static string Inv(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
