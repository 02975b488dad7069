namespace BinEnergy.Core.Economizer;

/// <summary>
/// A variable-volume fan's part-load power as a cubic in the flow fraction f = V / V_design:
/// P / P_design = c0 + c1 f + c2 f^2 + c3 f^3, held at f between 0 and 1.
/// </summary>
/// <param name="C0">Constant term.</param>
/// <param name="C1">Coefficient of f.</param>
/// <param name="C2">Coefficient of f^2.</param>
/// <param name="C3">Coefficient of f^3.</param>
public sealed record FanPartLoadCurve(double C0, double C1, double C2, double C3)
{
    /// <summary>
    /// The default: 0.0013 + 0.1470 f + 0.9506 f^2 - 0.0998 f^3, the part-load curve energy codes use
    /// for the variable-volume fans of their baseline buildings (ASHRAE/IES Standard 90.1,
    /// Appendix G, fan part-load performance; the coefficients recalled from memory). The energy
    /// code adopted locally governs; give the curve of the real fan and its control when known.
    /// </summary>
    public static FanPartLoadCurve Default { get; } = new(0.0013, 0.1470, 0.9506, -0.0998);

    /// <summary>The curve as a sentence, e.g. "0.0013 + 0.147 f + 0.9506 f^2 - 0.0998 f^3".</summary>
    public string Describe() => FormattableString.Invariant($"{C0:0.####} {Sign(C1)} {Math.Abs(C1):0.####} f {Sign(C2)} {Math.Abs(C2):0.####} f^2 {Sign(C3)} {Math.Abs(C3):0.####} f^3");

    /// <summary>P / P_design at a flow fraction (clamped to [0, 1]).</summary>
    public double Fraction(double flowFraction)
    {
        double f = Math.Clamp(flowFraction, 0.0, 1.0);
        return C0 + f * (C1 + f * (C2 + f * C3));
    }

    /// <summary>Problems with the curve against the smallest flow fraction it is used at; each names the key.</summary>
    public IEnumerable<EconomizerSettingsProblem> Problems(double minimumFraction)
    {
        double full = Fraction(1.0);
        if (!(full >= 0.9 && full <= 1.1))
        {
            yield return new("fan_curve", FormattableString.Invariant($"the fan part-load curve gives {full:0.###} at full flow; a curve of P / P_design gives about 1 there"));
        }

        for (int i = 0; i <= 20; i++)
        {
            double f = minimumFraction + (1.0 - minimumFraction) * i / 20.0;
            if (!(Fraction(f) > 0))
            {
                yield return new("fan_curve", FormattableString.Invariant($"the fan part-load curve is not above zero at flow fraction {f:0.##}"));
                yield break;
            }
        }
    }

    private static char Sign(double c) => c < 0 ? '-' : '+';
}
