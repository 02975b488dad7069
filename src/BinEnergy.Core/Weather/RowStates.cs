using System.Runtime.Intrinsics;
using BinEnergy.Core.Psychrometrics;

namespace BinEnergy.Core.Weather;

/// <summary>
/// The moist-air state of each row of a file whose humidity is given as dew point, solved by the parser beside its
/// rows (on the thread that parsed them) from the values as read: the dew point held to the dry-bulb (DESIGN 5.4), the
/// humidity ratio (ASHRAE Handbook—Fundamentals 2017, ch. 1, eqs. 5, 6 and 20), the wet-bulb (eqs. 33 and 35), the
/// enthalpy (eq. 32) and, where the file also has an RH column, the RH to check it against (eq. 12). They are the
/// record's own states when its hours are the rows in file order with nothing filled or dropped, which the builder
/// checks before using them; otherwise it solves the states again for the hours it ends with.
/// </summary>
internal sealed class RowStates
{
    /// <summary>Arrays for <paramref name="capacity"/> rows, with RH only when <paramref name="withRelativeHumidity"/>.</summary>
    public RowStates(int capacity, double? constantPressurePa, bool withRelativeHumidity)
    {
        DewPointC = GC.AllocateUninitializedArray<double>(capacity); // every row is written before it is read
        HumidityRatio = GC.AllocateUninitializedArray<double>(capacity);
        WetBulbC = GC.AllocateUninitializedArray<double>(capacity);
        EnthalpyJPerKg = GC.AllocateUninitializedArray<double>(capacity);
        RelativeHumidity = withRelativeHumidity ? GC.AllocateUninitializedArray<double>(capacity) : null;
        ConstantPressurePa = constantPressurePa;
    }

    /// <summary>The pressure of every row, Pa, where the file has no pressure column; null when the rows' own pressures were used.</summary>
    public double? ConstantPressurePa { get; }

    /// <summary>Dew point, C, never above the dry-bulb.</summary>
    public double[] DewPointC { get; }

    /// <summary>Humidity ratio, kg/kg.</summary>
    public double[] HumidityRatio { get; }

    /// <summary>Thermodynamic wet-bulb, C.</summary>
    public double[] WetBulbC { get; }

    /// <summary>Enthalpy, J/kg dry air, 0 C datum.</summary>
    public double[] EnthalpyJPerKg { get; }

    /// <summary>RH from the dry-bulb and humidity ratio, %, at most 100; null when the file has no RH column.</summary>
    public double[]? RelativeHumidity { get; }

    /// <summary>
    /// Solves the rows [<paramref name="start"/>, <paramref name="end"/>) from their dry-bulb, dew point and (when
    /// <see cref="ConstantPressurePa"/> is null) pressure; false, with nothing solved, when any of those is missing.
    /// </summary>
    public bool Solve(double[] dryBulbC, double[] dewPointC, double[]? pressurePa, int start, int end)
    {
        int n = end - start;
        var t = dryBulbC.AsSpan(start, n);
        var given = dewPointC.AsSpan(start, n);
        if (HasMissing(t) || HasMissing(given)
            || (pressurePa is not null && HasMissing(pressurePa.AsSpan(start, n))))
        {
            return false;
        }

        double[]? filled = null;
        var p = pressurePa is not null ? pressurePa.AsSpan(start, n) : (filled = System.Buffers.ArrayPool<double>.Shared.Rent(n)).AsSpan(0, n);
        try
        {
            if (filled is not null)
            {
                p.Fill(ConstantPressurePa!.Value);
            }

            var dew = DewPointC.AsSpan(start, n);
            int i = 0;
            for (; i + 4 <= n; i += 4)
            {
                var dryBulb = Vector256.Create(t.Slice(i, 4));
                var dewPoint = Vector256.Create(given.Slice(i, 4));
                Vector256.ConditionalSelect(Vector256.GreaterThan(dewPoint, dryBulb), dryBulb, dewPoint).CopyTo(dew.Slice(i, 4));
            }

            for (; i < n; i++)
            {
                dew[i] = given[i] > t[i] ? t[i] : given[i]; // held to the dry-bulb, as the builder holds it
            }

            HourlyStateBatchSolver.States(t, p, dew, HumidityRatio.AsSpan(start, n), humidityFromDewPoint: true, WetBulbC.AsSpan(start, n),
                EnthalpyJPerKg.AsSpan(start, n), RelativeHumidity is null ? [] : RelativeHumidity.AsSpan(start, n));
            return true;
        }
        catch (PsychrometricException)
        {
            return false; // the builder solves the hours again and says what is wrong
        }
        finally
        {
            if (filled is not null)
            {
                System.Buffers.ArrayPool<double>.Shared.Return(filled);
            }
        }
    }

    /// <summary>Moves rows [<paramref name="from"/>, from + <paramref name="count"/>) to start at <paramref name="to"/>.</summary>
    public void Move(int from, int to, int count)
    {
        foreach (var column in new[] { DewPointC, HumidityRatio, WetBulbC, EnthalpyJPerKg, RelativeHumidity })
        {
            if (column is not null)
            {
                Array.Copy(column, from, column, to, count);
            }
        }
    }

    private static bool HasMissing(ReadOnlySpan<double> values) => WeatherRecordBuilder.IndexOfMissing(values) < values.Length;
}
