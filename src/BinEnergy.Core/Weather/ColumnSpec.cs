namespace BinEnergy.Core.Weather;

/// <summary>
/// Where one quantity sits in a weather file and how to turn its numbers into the quantity:
/// value = raw x <see cref="Scale"/> + <see cref="Offset"/>, in <see cref="Unit"/>.
/// </summary>
/// <param name="Name">The column name as the header line writes it (matched exactly, then ignoring case and spaces).</param>
/// <param name="Unit">The unit after scaling: c, f or k for temperatures; pct or fraction for RH; kg/kg, g/kg or gr/lb for humidity
/// ratio; pa, hpa, mbar, kpa, psia or inhg for pressure.</param>
/// <param name="Scale">Multiplier applied to the raw number first (e.g. 0.1 for tenths of a degree).</param>
/// <param name="Offset">Added after the scale.</param>
public sealed record ColumnSpec(string Name, string Unit, double Scale = 1.0, double Offset = 0.0);
