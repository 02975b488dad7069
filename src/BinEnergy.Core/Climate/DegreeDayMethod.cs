namespace BinEnergy.Core.Climate;

/// <summary>How a day's temperature is taken for degree-days.</summary>
public enum DegreeDayMethod
{
    /// <summary>The mean of each day's hours (the default; how published degree-days from hourly data are counted).</summary>
    DailyMean,

    /// <summary>Every hour on its own: degree-hours / 24.</summary>
    Hourly,

    /// <summary>(Daily maximum + daily minimum) / 2, the weather services' daily mean from a max-min thermometer.</summary>
    MaxMin,
}
