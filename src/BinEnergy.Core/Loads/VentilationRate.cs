using BinEnergy.Core.Units;

namespace BinEnergy.Core.Loads;

/// <summary>
/// Outdoor airflow by the ventilation rate procedure of ASHRAE Standard 62.1: breathing-zone
/// flow V_bz = R_p P_z + R_a A_z, zone outdoor airflow V_oz = V_bz / E_z (62.1, section 6.2;
/// equation numbers 6-1 and 6-2 in the 2016 and 2019 editions, recalled from memory). The
/// user supplies the rates from the edition their local code adopts; none are built in.
/// </summary>
/// <param name="People">Zone population P_z.</param>
/// <param name="PerPerson">Outdoor airflow per person R_p.</param>
/// <param name="FloorAreaSquareMetres">Zone floor area A_z, m2.</param>
/// <param name="PerAreaLitresPerSecondPerSquareMetre">Outdoor airflow per unit area R_a, L/(s m2).</param>
/// <param name="ZoneEffectiveness">Zone air-distribution effectiveness E_z (1.0 for ceiling supply of cool air, from memory).</param>
public sealed record VentilationRate(
    double People,
    VolumeFlow PerPerson,
    double FloorAreaSquareMetres,
    double PerAreaLitresPerSecondPerSquareMetre,
    double ZoneEffectiveness = 1.0)
{
    /// <summary>Square metres in one square foot (exact, from the foot).</summary>
    public const double SquareMetresPerSquareFoot = Conversions.MetresPerFoot * Conversions.MetresPerFoot;

    /// <summary>Breathing-zone outdoor airflow V_bz = R_p P_z + R_a A_z.</summary>
    public VolumeFlow BreathingZoneAirflow =>
        VolumeFlow.FromLitresPerSecond(People * PerPerson.LitresPerSecond + FloorAreaSquareMetres * PerAreaLitresPerSecondPerSquareMetre);

    /// <summary>Zone outdoor airflow V_oz = V_bz / E_z.</summary>
    public VolumeFlow OutdoorAirflow => (1.0 / ZoneEffectiveness) * BreathingZoneAirflow;

    /// <summary>
    /// Airflow multipliers by hour of the day for demand-controlled ventilation: with the
    /// occupancy fraction f(h) resetting the people component, the hour's zone airflow is
    /// V_oz(h) = (R_p P_z f(h) + R_a A_z) / E_z (ASHRAE Standard 62.1 ventilation rate
    /// procedure; demand-controlled ventilation resets the people part only, the area part
    /// stays), returned as V_oz(h) / V_oz, each 0 to 1.
    /// </summary>
    /// <param name="occupancy">24 occupancy fractions, 0 to 1, index 0 for the hour beginning at 00:00.</param>
    /// <exception cref="ArgumentException">Not 24 fractions from 0 to 1, or the rates give no airflow.</exception>
    public double[] DemandControlledMultipliers(IReadOnlyList<double> occupancy)
    {
        ArgumentNullException.ThrowIfNull(occupancy);
        if (occupancy.Count != 24 || occupancy.Any(f => !(f >= 0 && f <= 1)))
        {
            throw new ArgumentException("give 24 occupancy fractions, each from 0 to 1", nameof(occupancy));
        }

        double people = People * PerPerson.LitresPerSecond;
        double area = FloorAreaSquareMetres * PerAreaLitresPerSecondPerSquareMetre;
        if (!(people + area > 0))
        {
            throw new ArgumentException("the people and area rates give no airflow", nameof(occupancy));
        }

        var multipliers = new double[24];
        for (int h = 0; h < 24; h++)
        {
            multipliers[h] = (people * occupancy[h] + area) / (people + area);
        }

        return multipliers;
    }

    /// <summary>The same rates given in IP: cfm per person, floor area in ft2, cfm per ft2.</summary>
    public static VentilationRate FromIp(double people, double cfmPerPerson, double floorAreaSquareFeet, double cfmPerSquareFoot,
        double zoneEffectiveness = 1.0) =>
        new(people, VolumeFlow.FromCfm(cfmPerPerson), floorAreaSquareFeet * SquareMetresPerSquareFoot,
            VolumeFlow.FromCfm(cfmPerSquareFoot).LitresPerSecond / SquareMetresPerSquareFoot, zoneEffectiveness);

    /// <summary>What is wrong with the rates, one sentence each (empty when they are usable).</summary>
    public IEnumerable<string> Problems()
    {
        if (!(People >= 0))
        {
            yield return "the number of people must be 0 or more";
        }

        if (!(PerPerson.CubicMetresPerSecond >= 0) || !(PerAreaLitresPerSecondPerSquareMetre >= 0) || !(FloorAreaSquareMetres >= 0))
        {
            yield return "the per-person rate, the per-area rate and the floor area must be 0 or more";
        }

        if (!(ZoneEffectiveness > 0 && ZoneEffectiveness <= 1.5))
        {
            yield return FormattableString.Invariant($"zone air-distribution effectiveness {ZoneEffectiveness} must be above 0 and at most 1.5");
        }

        if (!(BreathingZoneAirflow.CubicMetresPerSecond > 0))
        {
            yield return "people and area rates give no airflow: give at least one of them above zero";
        }
    }
}
