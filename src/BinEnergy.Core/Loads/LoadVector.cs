using System.Runtime.CompilerServices;
using BinEnergy.Core.Units;

namespace BinEnergy.Core.Loads;

/// <summary>
/// The outdoor-air loads of an hour, a bin, a month or a year, by one method: one energy per
/// <see cref="LoadFigure"/> and the hours ventilated. Adds up across hours, bins and months; a
/// value type that allocates nothing, so per-hour loops stay allocation-free.
/// </summary>
public struct LoadVector : IEquatable<LoadVector>
{
    /// <summary>How many figures a vector holds (one per <see cref="LoadFigure"/>).</summary>
    public const int FigureCount = 7;

    private FigureJoules joules;

    /// <summary>No energy, no hours.</summary>
    public static LoadVector Zero => default;

    /// <summary>Hours with outdoor air supplied (fractional only when a bin's hours are weighted).</summary>
    public double HoursVentilated { readonly get; private set; }

    /// <summary>One figure.</summary>
    public readonly Energy this[LoadFigure figure] => Energy.FromJoules(joules[(int)figure]);

    /// <summary>Heating of the outdoor air.</summary>
    public readonly Energy Heating => this[LoadFigure.Heating];

    /// <summary>Sensible cooling.</summary>
    public readonly Energy CoolingSensible => this[LoadFigure.CoolingSensible];

    /// <summary>Latent cooling (dehumidification).</summary>
    public readonly Energy CoolingLatent => this[LoadFigure.CoolingLatent];

    /// <summary>Sensible plus latent cooling.</summary>
    public readonly Energy Cooling => CoolingSensible + CoolingLatent;

    /// <summary>Humidification.</summary>
    public readonly Energy Humidification => this[LoadFigure.Humidification];

    /// <summary>Heating and humidification saved by the recovery device.</summary>
    public readonly Energy RecoveredHeating => this[LoadFigure.RecoveredHeating];

    /// <summary>Cooling saved by the recovery device.</summary>
    public readonly Energy RecoveredCooling => this[LoadFigure.RecoveredCooling];

    /// <summary>Fan electricity charged to the outdoor air.</summary>
    public readonly Energy FanEnergy => this[LoadFigure.FanEnergy];

    /// <summary>The thermal load the plant meets: heating, cooling and humidification.</summary>
    public readonly Energy ThermalTotal => Heating + Cooling + Humidification;

    /// <summary>Adds energy to one figure.</summary>
    internal void Add(LoadFigure figure, double addJoules) => joules[(int)figure] += addJoules;

    /// <summary>Adds hours ventilated.</summary>
    internal void AddHours(double hours) => HoursVentilated += hours;

    /// <summary>Adds another vector in place (the hourly sums' loop, without copying the sum).</summary>
    internal void Add(in LoadVector other)
    {
        for (int i = 0; i < FigureCount; i++)
        {
            joules[i] += other.joules[i];
        }

        HoursVentilated += other.HoursVentilated;
    }

    public static LoadVector operator +(in LoadVector a, in LoadVector b)
    {
        var sum = a;
        sum.Add(in b);
        return sum;
    }

    /// <summary>Every energy and the hours multiplied by <paramref name="factor"/> (e.g. to a mean year).</summary>
    public readonly LoadVector Scaled(double factor)
    {
        var r = this;
        for (int i = 0; i < FigureCount; i++)
        {
            r.joules[i] *= factor;
        }

        r.HoursVentilated *= factor;
        return r;
    }

    public readonly bool Equals(LoadVector other)
    {
        for (int i = 0; i < FigureCount; i++)
        {
            if (joules[i] != other.joules[i])
            {
                return false;
            }
        }

        return HoursVentilated == other.HoursVentilated;
    }

    public override readonly bool Equals(object? obj) => obj is LoadVector v && Equals(v);

    public override readonly int GetHashCode() => HashCode.Combine(joules[0], joules[1], joules[2], HoursVentilated);

    public static bool operator ==(LoadVector a, LoadVector b) => a.Equals(b);

    public static bool operator !=(LoadVector a, LoadVector b) => !a.Equals(b);

    /// <summary>The joules of the figures, inline in the struct.</summary>
    [InlineArray(FigureCount)]
    private struct FigureJoules
    {
        private double element;
    }
}
