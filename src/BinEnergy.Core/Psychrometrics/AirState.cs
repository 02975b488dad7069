using BinEnergy.Core.Units;

namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// One moist-air state with all its properties, computed once from a dry-bulb, a
/// humidity ratio and a total pressure with the equations of <see cref="MoistAir"/>
/// (ASHRAE Handbook—Fundamentals 2017, ch. 1). Create it through the factories, each
/// named for the humidity measure it takes; invalid inputs raise <see cref="PsychrometricException"/>.
/// </summary>
public sealed record AirState
{
    private AirState(double dryBulbC, double humidityRatio, double pressurePa)
    {
        MoistAir.CheckDryBulb(dryBulbC);
        MoistAir.CheckHumidityRatio(humidityRatio);
        if (!(pressurePa > 0))
        {
            throw new PsychrometricException(nameof(pressurePa), pressurePa, "pressure must be above zero");
        }

        double rh = MoistAir.RelativeHumidity(dryBulbC, humidityRatio, pressurePa);
        if (rh > 1.0 + 1e-6)
        {
            throw new PsychrometricException(nameof(humidityRatio), humidityRatio,
                FormattableString.Invariant($"humidity ratio {humidityRatio:0.######} kg/kg is above saturation at {dryBulbC:0.##} C (relative humidity would be {rh * 100:0.#} %)"));
        }

        DryBulb = Temperature.FromCelsius(dryBulbC);
        HumidityRatio = Units.HumidityRatio.FromKilogramsPerKilogram(humidityRatio);
        Pressure = Units.Pressure.FromPascals(pressurePa);
        RelativeHumidity = Math.Min(rh, 1.0);
        DewPoint = Temperature.FromCelsius(humidityRatio > 0 ? Math.Min(MoistAir.DewPoint(humidityRatio, pressurePa), dryBulbC) : double.NegativeInfinity);
        WetBulb = Temperature.FromCelsius(MoistAir.WetBulb(dryBulbC, humidityRatio, pressurePa));
        Enthalpy = SpecificEnthalpy.FromJoulesPerKilogram(MoistAir.Enthalpy(dryBulbC, humidityRatio));
        SpecificVolume = MoistAir.SpecificVolume(dryBulbC, humidityRatio, pressurePa);
        VapourPressure = Units.Pressure.FromPascals(MoistAir.VapourPressureFromHumidityRatio(humidityRatio, pressurePa));
    }

    public Temperature DryBulb { get; }

    public HumidityRatio HumidityRatio { get; }

    public Pressure Pressure { get; }

    /// <summary>Relative humidity, 0 to 1 (Handbook ch. 1, eq. 12).</summary>
    public double RelativeHumidity { get; }

    /// <summary>Dew point (minus infinity for perfectly dry air).</summary>
    public Temperature DewPoint { get; }

    /// <summary>Thermodynamic wet-bulb (Handbook ch. 1, eqs. 33 and 35).</summary>
    public Temperature WetBulb { get; }

    /// <summary>Enthalpy per unit mass of dry air (Handbook ch. 1, eq. 32).</summary>
    public SpecificEnthalpy Enthalpy { get; }

    /// <summary>Specific volume, m3 per kg of dry air (Handbook ch. 1, eq. 26).</summary>
    public double SpecificVolume { get; }

    /// <summary>Partial pressure of the water vapour (eq. 20 inverted).</summary>
    public Pressure VapourPressure { get; }

    /// <summary>Moist-air density, kg of mixture per m3: (1 + W) / v.</summary>
    public double Density => (1.0 + HumidityRatio.KilogramsPerKilogram) / SpecificVolume;

    /// <summary>Dry-air density, kg of dry air per m3 of mixture: 1 / v.</summary>
    public double DryAirDensity => 1.0 / SpecificVolume;

    /// <summary>The airflow factors of this state (dry-air density 1/v, this state's W).</summary>
    public AirflowFactors Factors => AirflowFactors.For(DryAirDensity, HumidityRatio.KilogramsPerKilogram);

    public static AirState FromHumidityRatio(Temperature dryBulb, HumidityRatio humidityRatio, Pressure pressure) =>
        new(dryBulb.Celsius, humidityRatio.KilogramsPerKilogram, pressure.Pascals);

    public static AirState FromDewPoint(Temperature dryBulb, Temperature dewPoint, Pressure pressure)
    {
        if (dewPoint.Celsius > dryBulb.Celsius + 1e-9)
        {
            throw new PsychrometricException(nameof(dewPoint), dewPoint.Celsius,
                FormattableString.Invariant($"dew point {dewPoint.Celsius:0.##} C is above the dry-bulb {dryBulb.Celsius:0.##} C"));
        }

        MoistAir.CheckDryBulb(dewPoint.Celsius);
        return new(dryBulb.Celsius, MoistAir.HumidityRatioFromDewPoint(dewPoint.Celsius, pressure.Pascals), pressure.Pascals);
    }

    public static AirState FromWetBulb(Temperature dryBulb, Temperature wetBulb, Pressure pressure)
    {
        MoistAir.CheckDryBulb(dryBulb.Celsius);
        MoistAir.CheckDryBulb(wetBulb.Celsius);
        return new(dryBulb.Celsius, MoistAir.HumidityRatioFromWetBulb(dryBulb.Celsius, wetBulb.Celsius, pressure.Pascals), pressure.Pascals);
    }

    /// <summary>From a relative humidity between 0 and 1.</summary>
    public static AirState FromRelativeHumidity(Temperature dryBulb, double relativeHumidity, Pressure pressure)
    {
        MoistAir.CheckDryBulb(dryBulb.Celsius);
        return new(dryBulb.Celsius, MoistAir.HumidityRatioFromRelativeHumidity(dryBulb.Celsius, relativeHumidity, pressure.Pascals), pressure.Pascals);
    }
}
