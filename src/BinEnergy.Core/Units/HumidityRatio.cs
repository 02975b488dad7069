namespace BinEnergy.Core.Units;

/// <summary>Humidity ratio: mass of water vapour per mass of dry air (kg/kg = lb/lb).</summary>
public readonly record struct HumidityRatio : IComparable<HumidityRatio>
{
    private HumidityRatio(double kgPerKg) => KilogramsPerKilogram = kgPerKg;

    /// <summary>kg of vapour per kg of dry air (numerically equal to lb/lb).</summary>
    public double KilogramsPerKilogram { get; }

    /// <summary>Grains of vapour per pound of dry air (7,000 gr = 1 lb).</summary>
    public double GrainsPerPound => KilogramsPerKilogram * Conversions.GrainsPerPound;

    /// <summary>Grams of vapour per kilogram of dry air.</summary>
    public double GramsPerKilogram => KilogramsPerKilogram * 1000.0;

    public static HumidityRatio FromKilogramsPerKilogram(double value) => new(value);

    public static HumidityRatio FromGrainsPerPound(double grains) => new(grains / Conversions.GrainsPerPound);

    public static HumidityRatio FromGramsPerKilogram(double grams) => new(grams / 1000.0);

    public int CompareTo(HumidityRatio other) => KilogramsPerKilogram.CompareTo(other.KilogramsPerKilogram);

    public override string ToString() => FormattableString.Invariant($"{KilogramsPerKilogram:0.######} kg/kg");
}
