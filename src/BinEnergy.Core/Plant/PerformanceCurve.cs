using MathNet.Numerics.Interpolation;

namespace BinEnergy.Core.Plant;

/// <summary>
/// A machine's efficiency (COP) as a function of the outdoor dry-bulb, from user points,
/// interpolated linearly between them (MathNet <see cref="LinearSpline"/>). Outside the
/// points the curve is held at its end value (clamped), and callers count how many hours
/// were evaluated outside so the result can say so: extrapolating a COP curve is how
/// estimates go wrong, and silently doing it would hide that.
/// </summary>
public sealed class PerformanceCurve : IEquatable<PerformanceCurve>
{
    private readonly IInterpolation? spline;

    private PerformanceCurve(double[] outdoorC, double[] cop)
    {
        OutdoorC = outdoorC;
        Cop = cop;
        spline = outdoorC.Length == 1 ? null : LinearSpline.InterpolateSorted(outdoorC, cop);
    }

    /// <summary>Outdoor dry-bulbs of the points, C, ascending.</summary>
    public IReadOnlyList<double> OutdoorC { get; }

    /// <summary>COP at each point.</summary>
    public IReadOnlyList<double> Cop { get; }

    /// <summary>Lowest outdoor dry-bulb of the points, C.</summary>
    public double MinOutdoorC => OutdoorC[0];

    /// <summary>Highest outdoor dry-bulb of the points, C.</summary>
    public double MaxOutdoorC => OutdoorC[^1];

    /// <summary>A curve with one COP at every outdoor temperature.</summary>
    public static PerformanceCurve Constant(double cop) => Create([(0.0, cop)]);

    /// <summary>
    /// Builds a curve from (outdoor C, COP) points. Points must have distinct temperatures and
    /// positive COPs; they are sorted here.
    /// </summary>
    /// <exception cref="ArgumentException">No points, a repeated temperature, or a COP that is not positive.</exception>
    public static PerformanceCurve Create(IEnumerable<(double OutdoorC, double Cop)> points)
    {
        var sorted = points.OrderBy(p => p.OutdoorC).ToArray();
        if (sorted.Length == 0)
        {
            throw new ArgumentException("a performance curve needs at least one point");
        }

        for (int i = 0; i < sorted.Length; i++)
        {
            if (!(sorted[i].Cop > 0) || double.IsInfinity(sorted[i].Cop))
            {
                throw new ArgumentException($"COP must be a positive number, not {sorted[i].Cop}");
            }

            if (i > 0 && sorted[i].OutdoorC == sorted[i - 1].OutdoorC)
            {
                throw new ArgumentException("two points have the same outdoor temperature");
            }
        }

        return new PerformanceCurve(sorted.Select(p => p.OutdoorC).ToArray(), sorted.Select(p => p.Cop).ToArray());
    }

    /// <summary>True when <paramref name="outdoorC"/> lies outside the points (the curve is clamped there).</summary>
    public bool IsOutside(double outdoorC) => OutdoorC.Count > 1 && (outdoorC < MinOutdoorC || outdoorC > MaxOutdoorC);

    /// <summary>The COP at an outdoor dry-bulb, C: linear between points, the end value outside them.</summary>
    public double Evaluate(double outdoorC)
    {
        if (spline is null)
        {
            return Cop[0];
        }

        return spline.Interpolate(Math.Clamp(outdoorC, MinOutdoorC, MaxOutdoorC));
    }

    /// <summary>True when <paramref name="other"/> has the same points (curves are immutable, so equal curves evaluate alike).</summary>
    public bool Equals(PerformanceCurve? other) =>
        other is not null && OutdoorC.SequenceEqual(other.OutdoorC) && Cop.SequenceEqual(other.Cop);

    public override bool Equals(object? obj) => Equals(obj as PerformanceCurve);

    public override int GetHashCode() => HashCode.Combine(OutdoorC.Count, OutdoorC[0], Cop[0]);
}
