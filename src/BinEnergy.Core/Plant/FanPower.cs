using BinEnergy.Core.Units;

namespace BinEnergy.Core.Plant;

/// <summary>
/// Electric power a fan draws to move air against a pressure rise: P = V x dp / eta, with V
/// the volume flow (m3/s), dp the total pressure rise (Pa) and eta the total (fan, motor and
/// drive) efficiency. Source: the fan air-power relation of ASHRAE Handbook—HVAC Systems and
/// Equipment, chapter "Fans" (air power = flow x pressure); in IP the same relation reads
/// bhp = cfm x in. w.g. / (6356 x eta) (common practice).
/// </summary>
public static class FanPower
{
    /// <summary>Electric power of a fan moving <paramref name="flow"/> against <paramref name="pressureRisePa"/>.</summary>
    /// <param name="flow">Volume flow through the fan.</param>
    /// <param name="pressureRisePa">Total pressure rise, Pa (zero or more).</param>
    /// <param name="efficiency">Total efficiency, in (0, 1].</param>
    public static Power Electric(VolumeFlow flow, double pressureRisePa, double efficiency)
    {
        if (!(efficiency > 0 && efficiency <= 1))
        {
            throw new ArgumentOutOfRangeException(nameof(efficiency), efficiency, "fan efficiency must be in (0, 1]");
        }

        if (!(pressureRisePa >= 0))
        {
            throw new ArgumentOutOfRangeException(nameof(pressureRisePa), pressureRisePa, "pressure rise must be zero or more");
        }

        return Power.FromWatts(flow.CubicMetresPerSecond * pressureRisePa / efficiency);
    }
}
