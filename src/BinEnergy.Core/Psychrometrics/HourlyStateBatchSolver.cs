using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;

namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// The moist-air properties of a whole record at once, four or eight hours to a SIMD vector
/// (<see cref="Vector256{T}"/> or, where the processor has AVX-512, <see cref="Vector512{T}"/>, with the
/// runtime's <c>Exp</c> and <c>Log</c>; see <see cref="ILanes{TSelf}"/>): saturation pressure by
/// Hyland and Wexler (ASHRAE Handbook—Fundamentals 2017, ch. 1, eqs. 5 and 6), dew point (eqs. 5
/// and 6 inverted) and thermodynamic wet-bulb (eqs. 33 and 35 with W_s* from eq. 23, solved for t*).
/// </summary>
/// <remarks>
/// The design asks for root finding by MathNet. Here the inverse functions are solved by a few
/// Newton steps written out over vectors instead, for speed: reading a station-year solves 8,760
/// wet-bulbs, and MathNet's solvers take one state at a time through delegates. MathNet stays the
/// reference: each lane whose Newton steps have not converged after <see cref="MaxNewtonSteps"/>
/// is solved again by the Brent-based <see cref="MoistAir"/> functions, and the tests hold the two
/// to the same roots on every hour of the real weather files. Results of one hour do not depend on
/// the hours beside it in its vector.
/// </remarks>
internal static class HourlyStateBatchSolver
{
    /// <summary>Hours per vector in the plain arithmetic loops (the exp and log loops take <see cref="ILanes{TSelf}.Count"/>).</summary>
    private const int Width = 4;

    /// <summary>The most hours per vector of either width.</summary>
    private const int MaxWidth = 8;

    /// <summary>
    /// Whether the exp and log loops take eight hours to a vector (the processor has AVX-512) rather than four. Each
    /// lane's result is the same either way (the runtime computes each lane of its <c>Exp</c> and <c>Log</c> alike);
    /// the tests hold the two to that.
    /// </summary>
    internal static bool WideLanes { get; } = Vector512.IsHardwareAccelerated;

    /// <summary>Newton steps before a lane is handed to the reference solver (two to four are needed from the first guesses used).</summary>
    internal const int MaxNewtonSteps = 8;

    /// <summary>
    /// A lane has converged after a Newton step shorter than this, K. Newton converges quadratically, so the point after
    /// that step is within about (f''/2f') x step^2 of the root, below 1e-9 K for these functions.
    /// </summary>
    private const double StepTolerance = 1e-4;

    private const double Kelvin = 273.15;

    private const uint AllLanes = (1u << Width) - 1;

    /// <summary>Saturation pressure over ice at 0 C, Pa (eq. 5; where eqs. 33 and 35 meet).</summary>
    private static readonly double IcePointPressure = Saturation.VapourPressurePa(0.0);

    /// <summary>
    /// Saturation vapour pressure p_ws in Pa of each temperature in C (eqs. 5 and 6), as <see cref="Saturation.VapourPressurePa"/>
    /// to its last bit or two. The last few are padded to a full vector, so each result is the same wherever the
    /// temperature stands in the span.
    /// </summary>
    /// <exception cref="PsychrometricException">A temperature is outside -100..200 C.</exception>
    public static void VapourPressures(ReadOnlySpan<double> temperatureC, Span<double> result) => VapourPressures(temperatureC, result, WideLanes);

    /// <summary>As the overload without <paramref name="wide"/>, eight temperatures to a vector when it is true, else four.</summary>
    internal static void VapourPressures(ReadOnlySpan<double> temperatureC, Span<double> result, bool wide)
    {
        CheckLengths(temperatureC.Length, result.Length);
        if (wide)
        {
            Solver<Lanes8>.VapourPressures(temperatureC, result);
        }
        else
        {
            Solver<Lanes4>.VapourPressures(temperatureC, result);
        }
    }

    /// <summary>
    /// Humidity ratio of each hour from its dew point (C) and pressure (Pa): p_w = p_ws(t_d) (eqs. 5 and 6, the definition
    /// of dew point), then W = 0.621945 p_w / (p - p_w) (eq. 20), as <see cref="MoistAir.HumidityRatioFromDewPoint"/>.
    /// </summary>
    /// <exception cref="PsychrometricException">A dew point is outside -100..200 C, or its vapour pressure is not below the pressure.</exception>
    public static void HumidityRatiosFromDewPoints(ReadOnlySpan<double> dewPointC, ReadOnlySpan<double> pressurePa, Span<double> humidityRatio)
    {
        CheckLengths(dewPointC.Length, pressurePa.Length, humidityRatio.Length);
        VapourPressures(dewPointC, humidityRatio);
        var ratio = Vector256.Create(MoistAir.MolecularMassRatio);
        int n = dewPointC.Length, i = 0;
        for (; i + Width <= n; i += Width)
        {
            var pw = Vector256.Create(humidityRatio.Slice(i, Width));
            var p = Vector256.Create(pressurePa.Slice(i, Width));
            if (Vector256.LessThan(pw, p).ExtractMostSignificantBits() != AllLanes)
            {
                break; // the scalar function below raises the error the caller expects
            }

            (ratio * pw / (p - pw)).CopyTo(humidityRatio.Slice(i, Width));
        }

        for (; i < n; i++)
        {
            humidityRatio[i] = MoistAir.HumidityRatioFromVapourPressure(humidityRatio[i], pressurePa[i]);
        }
    }

    /// <summary>
    /// Relative humidity, %, of each hour from dry-bulb (C), humidity ratio and pressure (Pa): p_w from eq. 20 solved for
    /// p_w, over p_ws(t) (eqs. 5, 6 and 12), at most 100, as <see cref="MoistAir.RelativeHumidity"/> times 100.
    /// </summary>
    /// <exception cref="PsychrometricException">A dry-bulb is outside -100..200 C.</exception>
    public static void RelativeHumidities(ReadOnlySpan<double> dryBulbC, ReadOnlySpan<double> humidityRatio, ReadOnlySpan<double> pressurePa, Span<double> percent)
    {
        CheckLengths(dryBulbC.Length, humidityRatio.Length, pressurePa.Length, percent.Length);
        VapourPressures(dryBulbC, percent);
        var ratio = Vector256.Create(MoistAir.MolecularMassRatio);
        var hundred = Vector256.Create(100.0);
        int n = dryBulbC.Length, i = 0;
        for (; i + Width <= n; i += Width)
        {
            var w = Vector256.Create(humidityRatio.Slice(i, Width));
            var pw = Vector256.Create(pressurePa.Slice(i, Width)) * w / (ratio + w);
            Vector256.Min(hundred, pw / Vector256.Create(percent.Slice(i, Width)) * hundred).CopyTo(percent.Slice(i, Width));
        }

        for (; i < n; i++)
        {
            percent[i] = Math.Min(100.0, MoistAir.VapourPressureFromHumidityRatio(humidityRatio[i], pressurePa[i]) / percent[i] * 100.0);
        }
    }

    /// <summary>
    /// Moist-air enthalpy in J/kg dry air (0 C datum) of each hour from dry-bulb (C) and humidity ratio: eq. 32, as
    /// <see cref="MoistAir.Enthalpy"/>.
    /// </summary>
    public static void Enthalpies(ReadOnlySpan<double> dryBulbC, ReadOnlySpan<double> humidityRatio, Span<double> enthalpyJPerKg)
    {
        CheckLengths(dryBulbC.Length, humidityRatio.Length, enthalpyJPerKg.Length);
        int n = dryBulbC.Length, i = 0;
        for (; i + Width <= n; i += Width)
        {
            // The scalar formula's own operations in its own order, so each hour's bits are the same either way.
            var t = Vector256.Create(dryBulbC.Slice(i, Width));
            var w = Vector256.Create(humidityRatio.Slice(i, Width));
            (Vector256.Create(MoistAir.DryAirSpecificHeat) * t + w * (Vector256.Create(MoistAir.LatentHeat) + Vector256.Create(MoistAir.VapourSpecificHeat) * t))
                .CopyTo(enthalpyJPerKg.Slice(i, Width));
        }

        for (; i < n; i++)
        {
            enthalpyJPerKg[i] = MoistAir.Enthalpy(dryBulbC[i], humidityRatio[i]);
        }
    }

    /// <summary>
    /// The moist-air state of a run of hours (Handbook ch. 1): where <paramref name="humidityFromDewPoint"/>, the humidity
    /// ratio from the dew point first (eqs. 5, 6 and 20); then the wet-bulb (eqs. 33 and 35), the enthalpy (eq. 32) and,
    /// unless <paramref name="relativeHumidity"/> is empty, the RH (eq. 12). The reader's one sequence of per-hour work,
    /// whether the parser or the record builder does it.
    /// </summary>
    public static void States(ReadOnlySpan<double> dryBulbC, ReadOnlySpan<double> pressurePa, ReadOnlySpan<double> dewPointC, Span<double> humidityRatio,
        bool humidityFromDewPoint, Span<double> wetBulbC, Span<double> enthalpyJPerKg, Span<double> relativeHumidity)
    {
        if (humidityFromDewPoint)
        {
            HumidityRatiosFromDewPoints(dewPointC, pressurePa, humidityRatio);
        }

        WetBulbs(dryBulbC, humidityRatio, pressurePa, dewPointC, wetBulbC);
        Enthalpies(dryBulbC, humidityRatio, enthalpyJPerKg);
        if (!relativeHumidity.IsEmpty)
        {
            RelativeHumidities(dryBulbC, humidityRatio, pressurePa, relativeHumidity);
        }
    }

    /// <summary>Records at least this long are solved in pieces on all cores (where the machine has two cores or more).</summary>
    internal const int ParallelHours = 2048;

    /// <summary>About how many hours make a piece: small enough that a core that starts late still finds pieces left.</summary>
    private const int HoursPerPiece = 1024;

    /// <summary>
    /// Runs <paramref name="work"/> over the hours [start, start + length) of a record of <paramref name="hours"/> hours:
    /// in pieces on all cores when the record is long and the machine has a second core, else all at once. The work
    /// must treat each hour on its own, so that the results are the same either way. The error raised is that of the
    /// first piece in the record's order that failed, once all pieces have stopped.
    /// </summary>
    public static void InPieces(int hours, Action<int, int> work)
    {
        if (hours < ParallelHours || Environment.ProcessorCount < 2)
        {
            work(0, hours);
            return;
        }

        int pieces = Math.Min(16, hours / HoursPerPiece);
        int size = (hours + pieces - 1) / pieces / MaxWidth * MaxWidth + MaxWidth; // whole vectors of either width
        Concurrency.Pieces.Run(pieces, k =>
        {
            int start = Math.Min(hours, k * size);
            work(start, Math.Min(hours, start + size) - start);
        });
    }

    /// <summary>
    /// <see cref="WetBulbs(ReadOnlySpan{double}, ReadOnlySpan{double}, ReadOnlySpan{double}, ReadOnlySpan{double}, Span{double})"/>
    /// for a whole record, in pieces on all cores when the record is long (<see cref="InPieces"/>). Each
    /// hour's result is the same either way: no hour depends on another.
    /// </summary>
    public static void WetBulbsOfRecord(double[] dryBulbC, double[] humidityRatio, double[] pressurePa, double[] dewPointC, double[] wetBulbC)
    {
        CheckLengths(dryBulbC.Length, humidityRatio.Length, pressurePa.Length, dewPointC.Length, wetBulbC.Length);
        InPieces(dryBulbC.Length, (start, length) =>
            WetBulbs(dryBulbC.AsSpan(start, length), humidityRatio.AsSpan(start, length), pressurePa.AsSpan(start, length),
                dewPointC.AsSpan(start, length), wetBulbC.AsSpan(start, length)));
    }

    /// <summary>
    /// Thermodynamic wet-bulb in C of each hour from dry-bulb, humidity ratio, pressure and dew point (the lower end
    /// of the bracket): eqs. 33 (t* at or above 0 C) and 35 (below) solved for t*, the same root as
    /// <see cref="MoistAir.WetBulb"/> within its accuracy. A state at or above saturation gets its dry-bulb.
    /// </summary>
    /// <remarks>
    /// Eqs. 33 and 35 do not meet exactly at 0 C, so a narrow band of states whose bracket [dew point, dry-bulb]
    /// straddles 0 C has a root on each side. The reference takes the one its bisection over the bracket reaches;
    /// here both roots are found and the same bisection is replayed on their signs alone (<see cref="BisectionPick"/>).
    /// </remarks>
    public static void WetBulbs(ReadOnlySpan<double> dryBulbC, ReadOnlySpan<double> humidityRatio, ReadOnlySpan<double> pressurePa,
        ReadOnlySpan<double> dewPointC, Span<double> wetBulbC) =>
        WetBulbs(dryBulbC, humidityRatio, pressurePa, dewPointC, wetBulbC, WideLanes);

    /// <summary>As the overload without <paramref name="wide"/>, eight hours to a vector when it is true, else four.</summary>
    internal static void WetBulbs(ReadOnlySpan<double> dryBulbC, ReadOnlySpan<double> humidityRatio, ReadOnlySpan<double> pressurePa,
        ReadOnlySpan<double> dewPointC, Span<double> wetBulbC, bool wide)
    {
        int n = dryBulbC.Length;
        CheckLengths(n, humidityRatio.Length, pressurePa.Length, dewPointC.Length, wetBulbC.Length);
        byte[] outcome = System.Buffers.ArrayPool<byte>.Shared.Rent(n);
        try
        {
            Solve(dryBulbC, humidityRatio, pressurePa, dewPointC, Side.Either, wetBulbC, outcome, wide);
            List<int>? twoRoots = null;
            for (int i = 0; i < n; i++)
            {
                if (outcome[i] == Outcome.TwoRoots)
                {
                    (twoRoots ??= []).Add(i);
                }
                else if (outcome[i] != Outcome.Converged)
                {
                    wetBulbC[i] = MoistAir.WetBulb(dryBulbC[i], humidityRatio[i], pressurePa[i]);
                }
            }

            if (twoRoots is not null)
            {
                PickBetweenRoots(dryBulbC, humidityRatio, pressurePa, dewPointC, wetBulbC, twoRoots, wide);
            }
        }
        finally
        {
            System.Buffers.ArrayPool<byte>.Shared.Return(outcome);
        }
    }

    /// <summary>
    /// The states with a root on each side of 0 C, whose root over ice the first pass found: finds the root over water
    /// and keeps the one the reference's bisection reaches.
    /// </summary>
    private static void PickBetweenRoots(ReadOnlySpan<double> dryBulbC, ReadOnlySpan<double> humidityRatio, ReadOnlySpan<double> pressurePa,
        ReadOnlySpan<double> dewPointC, Span<double> wetBulbC, List<int> hours, bool wide)
    {
        int m = hours.Count;
        var t = new double[m];
        var w = new double[m];
        var p = new double[m];
        var d = new double[m];
        var overWater = new double[m];
        var outcome = new byte[m];
        for (int k = 0; k < m; k++)
        {
            int i = hours[k];
            (t[k], w[k], p[k], d[k]) = (dryBulbC[i], humidityRatio[i], pressurePa[i], dewPointC[i]);
        }

        Solve(t, w, p, d, Side.Water, overWater, outcome, wide);
        for (int k = 0; k < m; k++)
        {
            int i = hours[k];
            double? pick = outcome[k] == Outcome.Converged ? BisectionPick(Math.Min(d[k], t[k]), t[k], wetBulbC[i], overWater[k]) : null;
            wetBulbC[i] = pick ?? MoistAir.WetBulb(t[k], w[k], p[k]);
        }
    }

    /// <summary>
    /// Which root bisection over [low, high] reaches when the residual is negative below <paramref name="iceRoot"/>,
    /// positive from there to 0 C, negative again up to <paramref name="waterRoot"/> and positive above it: the
    /// midpoints are compared with the roots instead of evaluating the residual. Null when a midpoint falls so near
    /// a root that its sign is in doubt (the caller then asks the reference solver).
    /// </summary>
    internal static double? BisectionPick(double low, double high, double iceRoot, double waterRoot)
    {
        const double doubt = 1e-6;
        for (int k = 0; k < 200; k++)
        {
            if (high <= 0.0)
            {
                return iceRoot;
            }

            if (low >= 0.0)
            {
                return waterRoot;
            }

            double mid = 0.5 * (low + high);
            if (Math.Abs(mid - iceRoot) < doubt || Math.Abs(mid - waterRoot) < doubt || Math.Abs(mid) < doubt)
            {
                return null;
            }

            bool positive = mid < 0.0 ? mid > iceRoot : mid > waterRoot;
            if (positive)
            {
                high = mid;
            }
            else
            {
                low = mid;
            }
        }

        return null;
    }

    /// <summary>The Newton solve of <see cref="Solver{TV}"/>, eight hours to a vector when <paramref name="wide"/>, else four.</summary>
    private static void Solve(ReadOnlySpan<double> t, ReadOnlySpan<double> w, ReadOnlySpan<double> p, ReadOnlySpan<double> dew, Side side,
        Span<double> x, Span<byte> outcome, bool wide)
    {
        if (wide)
        {
            Solver<Lanes8>.Solve(t, w, p, dew, side, x, outcome);
        }
        else
        {
            Solver<Lanes4>.Solve(t, w, p, dew, side, x, outcome);
        }
    }

    /// <summary>The side of 0 C a solve looks on: where the root is unique (either), or over water only.</summary>
    private enum Side
    {
        Either,
        Water,
    }

    /// <summary>How the solve of one hour ended.</summary>
    private static class Outcome
    {
        public const byte Converged = 0, NotConverged = 1, TwoRoots = 2;
    }

    /// <summary>Where each quantity of a block's lanes lies in the solver's state, in vectors from the block's start.</summary>
    private static class Slot
    {
        public const int Low = 0, High = 1, Liquid = 2, Converged = 3, TwoRoots = 4, Size = 5;
    }

    /// <summary>The input columns of a solve, from their first hour.</summary>
    private readonly ref struct Inputs(ref double t, ref double w, ref double p, ref double dew)
    {
        public readonly ref double T = ref t;
        public readonly ref double W = ref w;
        public readonly ref double P = ref p;
        public readonly ref double Dew = ref dew;
    }

    /// <summary>The vector solve, written once for either width of <see cref="ILanes{TSelf}"/>.</summary>
    private static class Solver<TV>
        where TV : struct, ILanes<TV>
    {
        /// <summary>Hours per vector.</summary>
        private static int W
        {
            [MethodImpl(MethodImplOptions.AggressiveInlining)]
            get => TV.Count;
        }

        private static uint AllLanes
        {
            [MethodImpl(MethodImplOptions.AggressiveInlining)]
            get => (1u << TV.Count) - 1;
        }

        /// <summary>See <see cref="HourlyStateBatchSolver.VapourPressures(ReadOnlySpan{double}, Span{double})"/>.</summary>
        public static void VapourPressures(ReadOnlySpan<double> temperatureC, Span<double> result)
        {
            int n = temperatureC.Length;
            int i = 0;
            for (; i + W <= n; i += W)
            {
                VapourPressureBlock(temperatureC.Slice(i, W), result.Slice(i, W));
            }

            if (i < n)
            {
                Span<double> padded = stackalloc double[2 * MaxWidth];
                Pad(temperatureC[i..], padded[..W]);
                VapourPressureBlock(padded[..W], padded[W..(2 * W)]);
                padded.Slice(W, n - i).CopyTo(result[i..]);
            }
        }

        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        private static void VapourPressureBlock(ReadOnlySpan<double> temperatureC, Span<double> result)
        {
            var t = TV.Load(temperatureC);
            TV.Exp(LnVapourPressure(t)).Store(result);
            var outside = ~(TV.GreaterThanOrEqual(t, TV.Create(Saturation.MinTemperatureC)) & TV.LessThanOrEqual(t, TV.Create(Saturation.MaxTemperatureC)));
            if (outside.Mask() != 0)
            {
                // The scalar function raises the error the caller expects.
                for (int k = 0; k < W; k++)
                {
                    result[k] = Saturation.VapourPressurePa(temperatureC[k]);
                }
            }
        }

        /// <summary>
        /// Newton steps over all blocks of <see cref="ILanes{TSelf}.Count"/> hours: each step is taken for every unfinished block before the next step,
        /// so that the processor works on many independent blocks at once rather than waiting on one block's chain of exp,
        /// log and divisions. The last few hours are padded with copies of the last one.
        /// </summary>
        public static void Solve(ReadOnlySpan<double> t, ReadOnlySpan<double> w, ReadOnlySpan<double> p, ReadOnlySpan<double> dew, Side side,
            Span<double> x, Span<byte> outcome)
        {
            int n = t.Length;
            int full = n / W;
            if (full > 0)
            {
                SolveBlocks(
                    new Inputs(ref MemoryMarshal.GetReference(t), ref MemoryMarshal.GetReference(w), ref MemoryMarshal.GetReference(p), ref MemoryMarshal.GetReference(dew)),
                    full, side, ref MemoryMarshal.GetReference(x), outcome);
            }

            int rest = n - full * W;
            if (rest > 0)
            {
                int at = full * W;
                Span<double> padded = stackalloc double[5 * MaxWidth];
                Span<double> pt = padded[..W], pw = padded[W..(2 * W)], pp = padded[(2 * W)..(3 * W)], pd = padded[(3 * W)..(4 * W)], px = padded[(4 * W)..(5 * W)];
                Pad(t[at..], pt);
                Pad(w[at..], pw);
                Pad(p[at..], pp);
                Pad(dew[at..], pd);
                Span<byte> last = stackalloc byte[MaxWidth];
                SolveBlocks(
                    new Inputs(ref MemoryMarshal.GetReference(pt), ref MemoryMarshal.GetReference(pw), ref MemoryMarshal.GetReference(pp), ref MemoryMarshal.GetReference(pd)),
                    1, side, ref MemoryMarshal.GetReference(px), last);
                px[..rest].CopyTo(x[at..]);
                last[..rest].CopyTo(outcome[at..]);
            }
        }

        private static void SolveBlocks(Inputs input, int blocks, Side side, ref double x, Span<byte> outcome)
        {
            double[] state = System.Buffers.ArrayPool<double>.Shared.Rent(blocks * Slot.Size * W);
            int[] active = System.Buffers.ArrayPool<int>.Shared.Rent(blocks);
            try
            {
                ref double first = ref MemoryMarshal.GetArrayDataReference(state);
                int count = 0;
                for (int b = 0; b < blocks; b++)
                {
                    if (StartBlock(input, b * W, side, ref x, ref Unsafe.Add(ref first, b * Slot.Size * W)))
                    {
                        active[count++] = b;
                    }
                }

                for (int step = 0; step < MaxNewtonSteps && count > 0; step++)
                {
                    int still = 0;
                    for (int k = 0; k < count; k++)
                    {
                        int b = active[k];
                        if (StepBlock(input, b * W, ref x, ref Unsafe.Add(ref first, b * Slot.Size * W)))
                        {
                            active[still++] = b;
                        }
                    }

                    count = still;
                }

                for (int b = 0; b < blocks; b++)
                {
                    for (int k = 0; k < W; k++)
                    {
                        int i = b * W + k;
                        outcome[i] = state[((b * Slot.Size) + Slot.Converged) * W + k] == 0.0 ? Outcome.NotConverged
                            : state[((b * Slot.Size) + Slot.TwoRoots) * W + k] != 0.0 ? Outcome.TwoRoots : Outcome.Converged;
                    }
                }
            }
            finally
            {
                System.Buffers.ArrayPool<double>.Shared.Return(state);
                System.Buffers.ArrayPool<int>.Shared.Return(active);
            }
        }

        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        private static TV Load(ref double column, int at) => TV.Load(ref column, (nuint)at);

        /// <summary>
        /// Sets up the block of hours from <paramref name="at"/>: the side of 0 C and bracket of each lane and the first
        /// guess; saturated lanes are settled at their dry-bulb, and lanes with a root on each side of 0 C (when looking on
        /// either side) are marked. Returns whether any lane needs Newton steps.
        /// </summary>
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        private static bool StartBlock(Inputs input, int at, Side side, ref double xColumn, ref double block)
        {
            var t = Load(ref input.T, at);
            var w = Load(ref input.W, at);
            var p = Load(ref input.P, at);
            var zero = TV.Zero;
            var low = TV.Min(Load(ref input.Dew, at), t);

            // Saturated (to rounding): the wet-bulb is the dry-bulb.
            var saturated = TV.LessThan(t - low, TV.Create(1e-9));

            // Which equation each lane solves. Eqs. 33 and 35 do not meet exactly at 0 C, so where the bracket
            // [dew point, dry-bulb] straddles 0 C the signs of both at 0 C say on which side the root lies; when they
            // differ there is a root on each side (or none but the jump at 0 C). The sign of W(0 C) - W with
            // W(0 C) = (a W_s0 - 1.006 t) / (a + 1.86 t) and W_s0 = 0.621945 p_ws0 / (p - p_ws0) (eq. 23) is that of
            // a 0.621945 p_ws0 - (1.006 t + W (a + 1.86 t)) (p - p_ws0): both denominators are positive, so no division.
            var icePoint = TV.Create(IcePointPressure);
            var gap0 = p - icePoint;
            var heat = TV.Create(1.006) * t;
            var wetSlope = TV.Create(1.86) * t;
            var mPws0 = TV.Create(MoistAir.MolecularMassRatio * IcePointPressure);
            var straddles = TV.LessThan(low, zero) & TV.GreaterThan(t, zero);
            var iceAbove = TV.GreaterThanOrEqual(TV.Create(2830.0) * mPws0 - (heat + w * (TV.Create(2830.0) + wetSlope)) * gap0, zero);
            var liquidAbove = TV.GreaterThanOrEqual(TV.Create(2501.0) * mPws0 - (heat + w * (TV.Create(2501.0) + wetSlope)) * gap0, zero);
            var twoRoots = straddles & (iceAbove ^ liquidAbove);
            var liquid = side == Side.Water
                ? TV.AllBitsSet
                : TV.GreaterThanOrEqual(low, zero) | (straddles & ~iceAbove & ~liquidAbove);
            if (side == Side.Water)
            {
                twoRoots = zero;
            }

            // The bracket of the chosen side.
            var lo = TV.Select(liquid, TV.Max(low, zero), low);
            var hi = TV.Select(liquid, t, TV.Min(t, zero));

            // First guess: F(t*) = (a - b t*) W_s(t*) - 1.006 (t - t*) - W (a + 1.86 t - c t*), eq. 33 or 35 times its
            // denominator, expanded to second order about the dew point, where W_s = W and its derivatives need no exp
            // (p_ws there is the vapour pressure, eq. 20 inverted); the root of that quadratic, within a few hundredths of
            // a kelvin of the root of F, is x = t_dew + u with u = -2F / (F' + sqrt(F'^2 - 2 F F'')).
            var (a, b, c) = Coefficients(liquid);
            var m = TV.Create(MoistAir.MolecularMassRatio);
            var cp = TV.Create(1.006);
            var pw = p * w / (m + w);
            var slope1 = LnVapourPressureDerivatives(low, out var slope2);
            var invGap = TV.One / (p - pw);
            var dpws = pw * slope1;
            var ws1 = m * p * dpws * invGap * invGap;
            var ws2 = m * p * (pw * (slope1 * slope1 + slope2) + TV.Create(2.0) * dpws * dpws * invGap) * invGap * invGap;
            var f = -(b * low * w) - cp * (t - low) - w * (TV.Create(1.86) * t - c * low);
            var f1 = -(b * w) + (a - b * low) * ws1 + cp + c * w;
            var f2 = TV.Create(-2.0) * b * ws1 + (a - b * low) * ws2;
            var u = TV.Create(-2.0) * f / (f1 + TV.Sqrt(TV.Max(f1 * f1 - TV.Create(2.0) * f * f2, zero)));
            var x = TV.Min(TV.Max(low + u, lo), hi);

            // Saturated: the dry-bulb. Two roots: this pass finds the one over ice, and the lane is marked for the caller.
            var settled = saturated;
            TV.Select(saturated, t, x).Store(ref xColumn, (nuint)at);
            (twoRoots & ~saturated).Store(ref block, (nuint)(W * Slot.TwoRoots));
            lo.Store(ref block, (nuint)(W * Slot.Low));
            hi.Store(ref block, (nuint)(W * Slot.High));
            liquid.Store(ref block, (nuint)(W * Slot.Liquid));
            settled.Store(ref block, (nuint)(W * Slot.Converged));
            return settled.Mask() != AllLanes;
        }

        /// <summary>One Newton step on the lanes of a block not yet converged; returns whether any lane is still unconverged.</summary>
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        private static bool StepBlock(Inputs input, int at, ref double xColumn, ref double block)
        {
            var x = Load(ref xColumn, at);
            var converged = TV.Load(ref block, (nuint)(W * Slot.Converged));
            var (a, b, c) = Coefficients(TV.Load(ref block, (nuint)(W * Slot.Liquid)));
            var next = x - WetBulbNewtonStep(x, Load(ref input.T, at), Load(ref input.P, at), Load(ref input.W, at), a, b, c);
            next = TV.Min(TV.Max(next, TV.Load(ref block, (nuint)(W * Slot.Low))), TV.Load(ref block, (nuint)(W * Slot.High)));
            var shortStep = TV.LessThan(TV.Abs(next - x), TV.Create(StepTolerance));
            TV.Select(converged, x, next).Store(ref xColumn, (nuint)at);
            converged |= shortStep;
            converged.Store(ref block, (nuint)(W * Slot.Converged));
            return converged.Mask() != AllLanes;
        }

        /// <summary>The coefficients a, b, c of eq. 33 (2501, 2.326, 4.186: over water) or eq. 35 (2830, 0.24, 2.1: over ice).</summary>
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        private static (TV A, TV B, TV C) Coefficients(TV liquid) =>
            (TV.Select(liquid, TV.Create(2501.0), TV.Create(2830.0)),
             TV.Select(liquid, TV.Create(2.326), TV.Create(0.24)),
             TV.Select(liquid, TV.Create(4.186), TV.Create(2.1)));

        /// <summary>
        /// The Newton step (W(t*) - W) / W'(t*) for eq. 33 or 35 (coefficients a, b, c: 2501, 2.326, 4.186 over water; 2830, 0.24,
        /// 2.1 over ice) with W_s* = 0.621945 p_ws / g, g = p - p_ws (eq. 23). With W = n / d the step is (n - W d) d / (n' d + n c);
        /// written with n = N / g and n' = M / g^2 it is (N - W d g) d g / (M d + N c g), one division.
        /// </summary>
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        private static TV WetBulbNewtonStep(TV x, TV t, TV p, TV w,
            TV a, TV b, TV c)
        {
            var pws = TV.Exp(LnVapourPressure(x, out var dln));
            var mPws = TV.Create(MoistAir.MolecularMassRatio) * pws;
            var g = p - pws;
            var cp = TV.Create(1.006);
            var latent = a - b * x;
            var n = latent * mPws - cp * (t - x) * g; // the numerator times g
            var d = a + TV.Create(1.86) * t - c * x;
            var dn = latent * mPws * p * dln - b * mPws * g + cp * g * g; // its derivative times g^2
            return (n - w * d * g) * d * g / (dn * d + n * c * g);
        }

        /// <summary>ln p_ws (Pa) at temperatures in C by eq. 5 at or below the triple point and eq. 6 above, as <see cref="Saturation.LnVapourPressure"/>.</summary>
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        private static TV LnVapourPressure(TV temperatureC)
        {
            var t = Absolute(temperatureC, out var inv, out var overIce);
            return Ln(t, inv, overIce);
        }

        /// <summary>ln p_ws (Pa) and its derivative in temperature, 1/K (eqs. 5 and 6 differentiated term by term).</summary>
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        private static TV LnVapourPressure(TV temperatureC, out TV derivative)
        {
            var t = Absolute(temperatureC, out var inv, out var overIce);
            derivative = Slope(t, inv, overIce);
            return Ln(t, inv, overIce);
        }

        /// <summary>First and second derivatives of ln p_ws in temperature, 1/K and 1/K^2, without ln p_ws itself.</summary>
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        private static TV LnVapourPressureDerivatives(TV temperatureC, out TV second)
        {
            var t = Absolute(temperatureC, out var inv, out var overIce);
            second = Curvature(t, inv, overIce);
            return Slope(t, inv, overIce);
        }

        /// <summary>Absolute temperature, K, its inverse, and where eq. 5 applies (at or below the triple point; eq. 6 above).</summary>
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        private static TV Absolute(TV temperatureC, out TV inverse, out TV overIce)
        {
            var t = temperatureC + TV.Create(Kelvin);
            inverse = TV.One / t;
            overIce = TV.LessThanOrEqual(temperatureC, TV.Create(Saturation.TriplePointC));
            return t;
        }

        /// <summary>Eqs. 5 and 6 at absolute temperature t (K), with 1/t given.</summary>
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        private static TV Ln(TV t, TV inv, TV overIce)
        {
            var lnT = TV.Log(t);
            var ice = TV.Create(Saturation.C1) * inv + TV.Create(Saturation.C2)
                + t * (TV.Create(Saturation.C3) + t * (TV.Create(Saturation.C4) + t * (TV.Create(Saturation.C5) + t * TV.Create(Saturation.C6))))
                + TV.Create(Saturation.C7) * lnT;
            var water = TV.Create(Saturation.C8) * inv + TV.Create(Saturation.C9)
                + t * (TV.Create(Saturation.C10) + t * (TV.Create(Saturation.C11) + t * TV.Create(Saturation.C12)))
                + TV.Create(Saturation.C13) * lnT;
            return TV.Select(overIce, ice, water);
        }

        /// <summary>Eqs. 5 and 6 differentiated once in t.</summary>
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        private static TV Slope(TV t, TV inv, TV overIce)
        {
            var ice = -TV.Create(Saturation.C1) * inv * inv + TV.Create(Saturation.C3)
                + t * (TV.Create(2 * Saturation.C4) + t * (TV.Create(3 * Saturation.C5) + t * TV.Create(4 * Saturation.C6)))
                + TV.Create(Saturation.C7) * inv;
            var water = -TV.Create(Saturation.C8) * inv * inv + TV.Create(Saturation.C10)
                + t * (TV.Create(2 * Saturation.C11) + t * TV.Create(3 * Saturation.C12))
                + TV.Create(Saturation.C13) * inv;
            return TV.Select(overIce, ice, water);
        }

        /// <summary>Eqs. 5 and 6 differentiated twice in t.</summary>
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        private static TV Curvature(TV t, TV inv, TV overIce)
        {
            var inv2 = inv * inv;
            var ice = TV.Create(2 * Saturation.C1) * inv2 * inv + TV.Create(2 * Saturation.C4)
                + t * (TV.Create(6 * Saturation.C5) + t * TV.Create(12 * Saturation.C6)) - TV.Create(Saturation.C7) * inv2;
            var water = TV.Create(2 * Saturation.C8) * inv2 * inv + TV.Create(2 * Saturation.C11)
                + t * TV.Create(6 * Saturation.C12) - TV.Create(Saturation.C13) * inv2;
            return TV.Select(overIce, ice, water);
        }
    }

    /// <summary>Copies the values and fills the rest of the block with the last of them.</summary>
    private static void Pad(ReadOnlySpan<double> values, Span<double> block)
    {
        values.CopyTo(block);
        block[values.Length..].Fill(values[^1]);
    }

    private static void CheckLengths(int n, params ReadOnlySpan<int> others)
    {
        foreach (int length in others)
        {
            if (length != n)
            {
                throw new ArgumentException("all hourly columns must have the same length");
            }
        }
    }
}
