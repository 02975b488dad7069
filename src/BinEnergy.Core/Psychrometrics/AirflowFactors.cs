using BinEnergy.Core.Units;

namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// The airflow factors that turn a volume flow and a difference of air state into a heat
/// rate: sensible (the trade's "1.08"), latent (the "4,840" per lb/lb, "0.68" per grain)
/// and total (the "4.5"). They follow from q = m c_p dt, q = m h_fg dW and q = m dh with
/// m = rho_da V, c_p = 1.006 + 1.86 W kJ/(kg K) and h_fg = 2,501 kJ/kg (ASHRAE
/// Handbook—Fundamentals 2017, ch. 1, eq. 32, the coefficients of which they are).
/// Stored in SI per L/s; converted exactly to IP per cfm.
/// </summary>
/// <remarks>
/// At standard air (0.075 lb/ft3 of dry air, W = 0) the sensible factor is 1.081
/// Btu/(h cfm F), the latent 4,839 Btu/(h cfm) per lb/lb, the total 4.50 Btu/(h cfm) per
/// Btu/lb: the trade's 1.08, 4,840 and 4.5 (common practice).
/// </remarks>
public sealed record AirflowFactors
{
    /// <summary>Btu/(h cfm F) in one W/(L/s K).</summary>
    public static readonly double IpSensiblePerSi = 3600.0 / Conversions.JoulesPerBtu * (Conversions.CubicMetresPerSecondPerCfm * 1000.0) / 1.8;

    /// <summary>Btu/(h cfm) in one W/(L/s).</summary>
    public static readonly double IpPowerPerFlowPerSi = 3600.0 / Conversions.JoulesPerBtu * (Conversions.CubicMetresPerSecondPerCfm * 1000.0);

    private AirflowFactors(double dryAirDensity, double humidityRatio)
    {
        DryAirDensity = dryAirDensity;
        HumidityRatio = humidityRatio;
    }

    /// <summary>Dry-air density of the flow basis, kg of dry air per m3.</summary>
    public double DryAirDensity { get; }

    /// <summary>Humidity ratio used in the humid specific heat, kg/kg.</summary>
    public double HumidityRatio { get; }

    /// <summary>Sensible factor, W/(L/s K): rho_da (1.006 + 1.86 W).</summary>
    public double SensibleSi => DryAirDensity * MoistAir.HumidSpecificHeat(HumidityRatio) / 1000.0;

    /// <summary>Latent factor, W/(L/s) per kg/kg: rho_da h_fg.</summary>
    public double LatentSi => DryAirDensity * MoistAir.LatentHeat / 1000.0;

    /// <summary>Total factor, W/(L/s) per kJ/kg: rho_da.</summary>
    public double TotalSi => DryAirDensity;

    /// <summary>Sensible factor, Btu/(h cfm F) (the trade's 1.08 at standard air).</summary>
    public double SensibleIp => SensibleSi * IpSensiblePerSi;

    /// <summary>Latent factor, Btu/(h cfm) per lb/lb (the trade's 4,840 at standard air).</summary>
    public double LatentIp => LatentSi * IpPowerPerFlowPerSi;

    /// <summary>Latent factor, Btu/(h cfm) per grain/lb (the trade's 0.68 to 0.69 at standard air).</summary>
    public double LatentIpPerGrain => LatentIp / Conversions.GrainsPerPound;

    /// <summary>Total factor, Btu/(h cfm) per Btu/lb (the trade's 4.5 at standard air).</summary>
    public double TotalIp => TotalSi * IpPowerPerFlowPerSi * Conversions.KilojoulesPerKilogramPerBtuPerPound;

    /// <summary>The sensible factor in the display unit of <paramref name="units"/>.</summary>
    public double Sensible(UnitSystem units) => units == UnitSystem.IP ? SensibleIp : SensibleSi;

    /// <summary>The latent factor in the display unit of <paramref name="units"/>.</summary>
    public double Latent(UnitSystem units) => units == UnitSystem.IP ? LatentIp : LatentSi;

    /// <summary>The total factor in the display unit of <paramref name="units"/>.</summary>
    public double Total(UnitSystem units) => units == UnitSystem.IP ? TotalIp : TotalSi;

    /// <summary>Factors for a dry-air density (kg/m3) and a humidity ratio (kg/kg).</summary>
    public static AirflowFactors For(double dryAirDensity, double humidityRatio)
    {
        if (!(dryAirDensity > 0))
        {
            throw new PsychrometricException(nameof(dryAirDensity), dryAirDensity, "dry-air density must be above zero");
        }

        MoistAir.CheckHumidityRatio(humidityRatio);
        return new AirflowFactors(dryAirDensity, humidityRatio);
    }

    /// <summary>The trade's standard air: 0.075 lb/ft3 of dry air, W = 0.</summary>
    public static AirflowFactors StandardAir { get; } = For(FlowBasisDensity.StandardAirDensity, 0.0);
}
