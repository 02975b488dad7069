namespace BinEnergy.Core.Weather;

/// <summary>The hourly quantities a weather file may carry (DESIGN 5.1).</summary>
public enum WeatherQuantity
{
    /// <summary>Dry-bulb temperature (required).</summary>
    DryBulb,

    /// <summary>Dew-point temperature (first choice of humidity measure).</summary>
    DewPoint,

    /// <summary>Humidity ratio, kg/kg = lb/lb (second choice).</summary>
    HumidityRatio,

    /// <summary>Thermodynamic wet-bulb temperature (third choice).</summary>
    WetBulb,

    /// <summary>Relative humidity (fourth choice).</summary>
    RelativeHumidity,

    /// <summary>Station pressure (optional).</summary>
    Pressure,
}
