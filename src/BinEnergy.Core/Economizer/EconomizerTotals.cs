using BinEnergy.Core.Plant;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Economizer;

/// <summary>
/// Hours per mode, coil energy and the compressor energy bought for it, of one control over a
/// set of occupied hours (a year, a month or a bin), by one integration method. Hours are whole
/// in the hourly method; a bin's hours may be fractional only where a bin method weights them.
/// </summary>
/// <param name="HoursNoCooling">Occupied hours with no cooling needed.</param>
/// <param name="HoursFree">Hours of free cooling (economizer on, coil off).</param>
/// <param name="HoursIntegrated">Hours of integrated operation (economizer on, coil trimming).</param>
/// <param name="HoursMinimum">Hours at minimum outdoor air (disabled, locked out, or no economizer).</param>
/// <param name="CoilSensible">Sensible coil energy.</param>
/// <param name="CoilLatent">Latent coil energy.</param>
/// <param name="Compressor">Electricity bought for the coil energy through the cooling COP (zero without a plant).</param>
public sealed record EconomizerTotals(
    double HoursNoCooling,
    double HoursFree,
    double HoursIntegrated,
    double HoursMinimum,
    Energy CoilSensible,
    Energy CoilLatent,
    SiteEnergy Compressor)
{
    /// <summary>No hours, no energy.</summary>
    public static EconomizerTotals Zero { get; } = new(0, 0, 0, 0, Energy.FromJoules(0), Energy.FromJoules(0), SiteEnergy.Zero);

    /// <summary>Terminal reheat (heating delivered to the air).</summary>
    public Energy Reheat { get; init; } = Energy.FromJoules(0);

    /// <summary>Preheat of mixed air below the coil-leaving temperature (heating delivered to the air).</summary>
    public Energy Preheat { get; init; } = Energy.FromJoules(0);

    /// <summary>Building sensible load the supply could not meet (shown, not bought).</summary>
    public Energy Unmet { get; init; } = Energy.FromJoules(0);

    /// <summary>Fuel or electricity bought for the reheat and preheat through the plant's heating (zero without a plant).</summary>
    public SiteEnergy Heating { get; init; } = SiteEnergy.Zero;

    /// <summary>Electricity of the supply and return fans over all the occupied hours (the same for a control and its baseline: the airflow does not depend on the damper).</summary>
    public Energy Fans { get; init; } = Energy.FromJoules(0);

    /// <summary>The fans' electricity bought through the plant (zero without a plant).</summary>
    public SiteEnergy FanElectricity { get; init; } = SiteEnergy.Zero;

    /// <summary>Every hour and energy multiplied by <paramref name="factor"/> (e.g. to a mean year).</summary>
    public EconomizerTotals Scaled(double factor) => new(HoursNoCooling * factor, HoursFree * factor, HoursIntegrated * factor, HoursMinimum * factor,
        Energy.FromJoules(CoilSensible.Joules * factor), Energy.FromJoules(CoilLatent.Joules * factor), Compressor.Scaled(factor))
    {
        Reheat = Energy.FromJoules(Reheat.Joules * factor),
        Preheat = Energy.FromJoules(Preheat.Joules * factor),
        Unmet = Energy.FromJoules(Unmet.Joules * factor),
        Heating = Heating.Scaled(factor),
        Fans = Energy.FromJoules(Fans.Joules * factor),
        FanElectricity = FanElectricity.Scaled(factor),
    };

    /// <summary>Heating delivered to the air: reheat plus preheat.</summary>
    public Energy HeatingTotal => Reheat + Preheat;

    /// <summary>Everything bought: compressor electricity, the heating fuel for reheat and preheat, and the fans' electricity.</summary>
    public SiteEnergy Purchased => Compressor + Heating + FanElectricity;

    /// <summary>Total coil energy: sensible plus latent.</summary>
    public Energy CoilTotal => CoilSensible + CoilLatent;

    /// <summary>All occupied hours (the four modes sum to them).</summary>
    public double Hours => HoursNoCooling + HoursFree + HoursIntegrated + HoursMinimum;

    /// <summary>Hours in one mode.</summary>
    public double HoursIn(EconomizerMode mode) => mode switch
    {
        EconomizerMode.NoCooling => HoursNoCooling,
        EconomizerMode.FreeCooling => HoursFree,
        EconomizerMode.Integrated => HoursIntegrated,
        EconomizerMode.MinimumOutdoorAir => HoursMinimum,
        _ => throw new ArgumentOutOfRangeException(nameof(mode), mode, "unknown mode"),
    };

    /// <summary>
    /// Coil energy saved against <paramref name="baseline"/> (baseline minus this). Negative
    /// when this control adds coil energy; never clipped.
    /// </summary>
    public Energy SavingsAgainst(EconomizerTotals baseline) => baseline.CoilTotal - CoilTotal;

    /// <summary>Savings as a percentage of the baseline coil energy; null when the baseline has none.</summary>
    public double? SavingsPercentAgainst(EconomizerTotals baseline) =>
        baseline.CoilTotal.Joules > 0 ? SavingsAgainst(baseline).Joules / baseline.CoilTotal.Joules * 100.0 : null;

    /// <summary>Latent coil energy saved against <paramref name="baseline"/>; negative when this control adds latent load.</summary>
    public Energy LatentSavingsAgainst(EconomizerTotals baseline) => baseline.CoilLatent - CoilLatent;

    /// <summary>Reheat and preheat saved against <paramref name="baseline"/>; negative when this control adds heating.</summary>
    public Energy HeatingSavingsAgainst(EconomizerTotals baseline) => baseline.HeatingTotal - HeatingTotal;

    /// <summary>Everything bought (compressor and heating) saved against <paramref name="baseline"/>: energy, cost and carbon.</summary>
    public SiteEnergy PurchasedSavingsAgainst(EconomizerTotals baseline) => baseline.Purchased - Purchased;

    /// <summary>Compressor electricity, cost and carbon saved against <paramref name="baseline"/>.</summary>
    public SiteEnergy CompressorSavingsAgainst(EconomizerTotals baseline) => baseline.Compressor - Compressor;
}
