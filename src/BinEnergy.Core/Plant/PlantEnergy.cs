using System.Runtime.CompilerServices;

namespace BinEnergy.Core.Plant;

/// <summary>
/// The energy the plant buys to meet a set of loads (an hour, a bin, a month, a year), per
/// <see cref="EndUse"/>, each with its fuel, cost and carbon. Adds up; allocates nothing.
/// </summary>
public struct PlantEnergy : IEquatable<PlantEnergy>
{
    /// <summary>How many end uses there are.</summary>
    public const int EndUseCount = 5;

    private EndUses uses;

    /// <summary>Nothing bought.</summary>
    public static PlantEnergy Zero => default;

    /// <summary>The energy bought for one end use.</summary>
    public readonly SiteEnergy this[EndUse use] => uses[(int)use];

    /// <summary>Everything bought.</summary>
    public readonly SiteEnergy Total
    {
        get
        {
            var total = SiteEnergy.Zero;
            for (int i = 0; i < EndUseCount; i++)
            {
                total += uses[i];
            }

            return total;
        }
    }

    /// <summary>Adds energy bought for one end use.</summary>
    internal void Add(EndUse use, in SiteEnergy energy) => uses[(int)use] += energy;

    public static PlantEnergy operator +(in PlantEnergy a, in PlantEnergy b)
    {
        var sum = a;
        for (int i = 0; i < EndUseCount; i++)
        {
            sum.uses[i] += b.uses[i];
        }

        return sum;
    }

    /// <summary>Every amount multiplied by <paramref name="factor"/>.</summary>
    public readonly PlantEnergy Scaled(double factor)
    {
        var r = this;
        for (int i = 0; i < EndUseCount; i++)
        {
            r.uses[i] = r.uses[i].Scaled(factor);
        }

        return r;
    }

    public readonly bool Equals(PlantEnergy other)
    {
        for (int i = 0; i < EndUseCount; i++)
        {
            if (uses[i] != other.uses[i])
            {
                return false;
            }
        }

        return true;
    }

    public override readonly bool Equals(object? obj) => obj is PlantEnergy p && Equals(p);

    public override readonly int GetHashCode() => HashCode.Combine(uses[0], uses[1], uses[2], uses[3], uses[4]);

    public static bool operator ==(PlantEnergy a, PlantEnergy b) => a.Equals(b);

    public static bool operator !=(PlantEnergy a, PlantEnergy b) => !a.Equals(b);

    [InlineArray(EndUseCount)]
    private struct EndUses
    {
        private SiteEnergy element;
    }
}
