using BinEnergy.Core.Plant;

namespace BinEnergy.Core.Study.Results;

/// <summary>One economizer control (or the baseline, <c>none</c>) of one case by one method, in SI.</summary>
/// <param name="Method"><c>bin</c> or <c>hourly</c>.</param>
/// <param name="Control">Control name (<c>none</c> for the baseline).</param>
/// <param name="Integrated">Whether the economizer keeps running while the coil trims.</param>
/// <param name="HoursNoCooling">Occupied hours needing no cooling.</param>
/// <param name="HoursFree">Hours of free cooling.</param>
/// <param name="HoursIntegrated">Hours of integrated operation.</param>
/// <param name="HoursMinimum">Hours at minimum outdoor air.</param>
/// <param name="CoilSensibleJ">Sensible coil load, J.</param>
/// <param name="CoilLatentJ">Latent coil load, J.</param>
/// <param name="CoilTotalJ">Total coil load, J.</param>
/// <param name="SavingsJ">Coil load saved against the baseline, J (negative when the control adds load).</param>
/// <param name="Compressor">Electricity bought for the coil load through the cooling COP.</param>
/// <param name="CompressorSavings">Electricity (cost, carbon) saved against the baseline.</param>
public sealed record EconomizerFigures(
    string Method,
    string Control,
    bool Integrated,
    double HoursNoCooling,
    double HoursFree,
    double HoursIntegrated,
    double HoursMinimum,
    double CoilSensibleJ,
    double CoilLatentJ,
    double CoilTotalJ,
    double SavingsJ,
    SiteEnergy Compressor,
    SiteEnergy CompressorSavings);
