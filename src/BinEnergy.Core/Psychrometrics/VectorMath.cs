using System.Runtime.Intrinsics;

namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// Elementary functions over <see cref="Vector256{T}"/> of doubles for the batch solvers, where
/// the runtime's own vector <c>Exp</c> is no faster than four scalar calls.
/// </summary>
internal static class VectorMath
{
    /// <summary>ln 2 split in a high part with its last 11 bits zero and the rest, so k ln 2 is exact for |k| &lt; 2^11 (Cody and Waite).</summary>
    private const double Ln2High = 0.693145751953125;
    private const double Ln2Low = 1.42860682030941723212e-6;

    /// <summary>1.5 x 2^52: adding it rounds a double of magnitude below 2^51 to an integer held in the low mantissa bits.</summary>
    private const double RoundingShift = 6755399441055744.0;

    /// <summary>
    /// e^x for |x| up to about 700 (no overflow, infinity or NaN handling; the callers' arguments lie between -10 and
    /// 15). Range reduction of W. J. Cody and W. Waite (Software Manual for the Elementary Functions, 1980):
    /// x = k ln 2 + r with |r| &lt;= ln 2 / 2, e^x = 2^k e^r; e^r by its Taylor series to r^13 (remainder below
    /// 2e-16 relative), evaluated by Horner's rule; 2^k added to the exponent bits. Agrees with
    /// <see cref="Math.Exp"/> to within a few units in the last place.
    /// </summary>
    public static Vector256<double> Exp(Vector256<double> x)
    {
        var shifted = x * Vector256.Create(1.4426950408889634) + Vector256.Create(RoundingShift); // x / ln 2, rounded
        var k = shifted - Vector256.Create(RoundingShift);
        var r = x - k * Vector256.Create(Ln2High) - k * Vector256.Create(Ln2Low);

        var p = Vector256.Create(1.0 / 6227020800.0); // 1/13!
        p = p * r + Vector256.Create(1.0 / 479001600.0);
        p = p * r + Vector256.Create(1.0 / 39916800.0);
        p = p * r + Vector256.Create(1.0 / 3628800.0);
        p = p * r + Vector256.Create(1.0 / 362880.0);
        p = p * r + Vector256.Create(1.0 / 40320.0);
        p = p * r + Vector256.Create(1.0 / 5040.0);
        p = p * r + Vector256.Create(1.0 / 720.0);
        p = p * r + Vector256.Create(1.0 / 120.0);
        p = p * r + Vector256.Create(1.0 / 24.0);
        p = p * r + Vector256.Create(1.0 / 6.0);
        p = p * r + Vector256.Create(0.5);
        p = p * r + Vector256<double>.One;
        p = p * r + Vector256<double>.One;

        // k sits in the low bits of the shifted value; move it into the exponent field.
        var exponent = Vector256.ShiftLeft(shifted.AsInt64() - Vector256.Create(RoundingShift).AsInt64(), 52);
        return (p.AsInt64() + exponent).AsDouble();
    }
}
