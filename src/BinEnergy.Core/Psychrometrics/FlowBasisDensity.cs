namespace BinEnergy.Core.Psychrometrics;

/// <summary>Dry-air densities behind each <see cref="FlowBasis"/>.</summary>
public static class FlowBasisDensity
{
    /// <summary>
    /// Standard air, 0.075 lb/ft3 = 1.2014 kg/m3 (common practice; the density behind the
    /// trade's 1.08; its SI rounding is 1.2 kg/m3).
    /// </summary>
    public const double StandardAirDensity = 0.075 * Units.Conversions.KilogramsPerPound / Units.Conversions.CubicMetresPerCubicFoot;

    /// <summary>The indoor temperature of the <see cref="FlowBasis.Site"/> basis: 70 F = 21.11 C.</summary>
    public const double SiteBasisTemperatureC = (70.0 - 32.0) / 1.8;

    /// <summary>
    /// Dry-air density of dry air at 70 F and the site pressure (Handbook ch. 1, eq. 26 with W = 0).
    /// </summary>
    public static double Site(double sitePressurePa) => MoistAir.DryAirDensity(SiteBasisTemperatureC, 0.0, sitePressurePa);

    /// <summary>
    /// Dry-air density for a basis: standard and site are constants for a site; actual is the
    /// dry-air density of the given state.
    /// </summary>
    public static double For(FlowBasis basis, double sitePressurePa, double dryBulbC, double humidityRatio, double pressurePa) => basis switch
    {
        FlowBasis.Standard => StandardAirDensity,
        FlowBasis.Site => Site(sitePressurePa),
        FlowBasis.Actual => MoistAir.DryAirDensity(dryBulbC, humidityRatio, pressurePa),
        _ => throw new ArgumentOutOfRangeException(nameof(basis), basis, "unknown flow basis"),
    };
}
