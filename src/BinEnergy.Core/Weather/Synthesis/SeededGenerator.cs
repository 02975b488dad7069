namespace BinEnergy.Core.Weather.Synthesis;

/// <summary>
/// The synthesizer's own pseudo-random generator, so a seed gives the same weather on every
/// machine and every .NET version (System.Random's seeded algorithm is not promised to stay
/// fixed). Uniform numbers come from xoshiro256** (Blackman and Vigna, "Scrambled linear
/// pseudorandom number generators", ACM Trans. Math. Softw. 47(4), 2021), its 256-bit state
/// filled from the seed by SplitMix64 as those authors recommend; normal deviates come from
/// the Box-Muller transform (Box and Muller, Ann. Math. Stat. 29, 1958), both values of each
/// pair used. Integer arithmetic only, apart from the logarithm, square root and cosine of
/// Box-Muller.
/// </summary>
public sealed class SeededGenerator
{
    private ulong s0, s1, s2, s3;
    private double spareNormal;
    private bool hasSpare;

    /// <summary>Starts the generator from a seed; equal seeds give equal sequences.</summary>
    public SeededGenerator(ulong seed)
    {
        ulong x = seed;
        s0 = SplitMix64(ref x);
        s1 = SplitMix64(ref x);
        s2 = SplitMix64(ref x);
        s3 = SplitMix64(ref x);
    }

    /// <summary>Starts from a given 256-bit state (for checks against published sequences); not all zero.</summary>
    internal SeededGenerator(ulong a, ulong b, ulong c, ulong d)
    {
        if ((a | b | c | d) == 0)
        {
            throw new ArgumentException("the state of xoshiro256** must not be all zero");
        }

        (s0, s1, s2, s3) = (a, b, c, d);
    }

    /// <summary>One step of SplitMix64 (Steele, Lea and Flood, OOPSLA 2014): advances <paramref name="x"/> and returns the mixed value.</summary>
    internal static ulong SplitMix64(ref ulong x)
    {
        x += 0x9E3779B97F4A7C15UL;
        ulong z = x;
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        return z ^ (z >> 31);
    }

    /// <summary>The next 64-bit output of xoshiro256**.</summary>
    public ulong NextUInt64()
    {
        ulong result = RotateLeft(s1 * 5, 7) * 9;
        ulong t = s1 << 17;
        s2 ^= s0;
        s3 ^= s1;
        s1 ^= s2;
        s0 ^= s3;
        s2 ^= t;
        s3 = RotateLeft(s3, 45);
        return result;
    }

    /// <summary>A uniform number in [0, 1): the top 53 bits of the next output times 2^-53.</summary>
    public double NextDouble() => (NextUInt64() >> 11) * (1.0 / (1UL << 53));

    /// <summary>A standard normal deviate (mean 0, standard deviation 1) by the Box-Muller transform.</summary>
    public double NextNormal()
    {
        if (hasSpare)
        {
            hasSpare = false;
            return spareNormal;
        }

        double u1 = 1.0 - NextDouble(); // (0, 1], so the logarithm is finite
        double u2 = NextDouble();
        double r = Math.Sqrt(-2.0 * Math.Log(u1));
        double angle = 2.0 * Math.PI * u2;
        spareNormal = r * Math.Sin(angle);
        hasSpare = true;
        return r * Math.Cos(angle);
    }

    private static ulong RotateLeft(ulong x, int k) => (x << k) | (x >> (64 - k));
}
