using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;

namespace BinEnergy.Core.Psychrometrics;

/// <summary>
/// The operations the batch solver needs on a SIMD vector of doubles, so that it is written once for four hours to a
/// vector (<see cref="Lanes4"/>, AVX2 and most processors) and eight (<see cref="Lanes8"/>, where AVX-512 is there).
/// Each member is the runtime's own vector operation of that width; <c>Exp</c> and <c>Log</c> are the runtime's, which
/// compute each lane alike whatever the width.
/// </summary>
internal interface ILanes<TSelf>
    where TSelf : struct, ILanes<TSelf>
{
    /// <summary>Hours per vector.</summary>
    static abstract int Count { get; }

    static abstract TSelf Zero { get; }

    static abstract TSelf One { get; }

    static abstract TSelf AllBitsSet { get; }

    static abstract TSelf Create(double value);

    static abstract TSelf Load(ref double source, nuint at);

    static abstract TSelf Load(ReadOnlySpan<double> source);

    void Store(ref double destination, nuint at);

    void Store(Span<double> destination);

    /// <summary>One bit per lane, lane 0 lowest: its sign bit (for a comparison's mask, whether it holds).</summary>
    uint Mask();

    static abstract TSelf operator +(TSelf a, TSelf b);

    static abstract TSelf operator -(TSelf a, TSelf b);

    static abstract TSelf operator -(TSelf a);

    static abstract TSelf operator *(TSelf a, TSelf b);

    static abstract TSelf operator /(TSelf a, TSelf b);

    static abstract TSelf operator &(TSelf a, TSelf b);

    static abstract TSelf operator |(TSelf a, TSelf b);

    static abstract TSelf operator ^(TSelf a, TSelf b);

    static abstract TSelf operator ~(TSelf a);

    static abstract TSelf Exp(TSelf x);

    static abstract TSelf Log(TSelf x);

    static abstract TSelf Sqrt(TSelf x);

    static abstract TSelf Abs(TSelf x);

    static abstract TSelf Min(TSelf a, TSelf b);

    static abstract TSelf Max(TSelf a, TSelf b);

    static abstract TSelf Select(TSelf mask, TSelf whenSet, TSelf otherwise);

    static abstract TSelf LessThan(TSelf a, TSelf b);

    static abstract TSelf LessThanOrEqual(TSelf a, TSelf b);

    static abstract TSelf GreaterThan(TSelf a, TSelf b);

    static abstract TSelf GreaterThanOrEqual(TSelf a, TSelf b);
}

/// <summary>Four hours to a <see cref="Vector256{T}"/>.</summary>
internal readonly struct Lanes4(Vector256<double> value) : ILanes<Lanes4>
{
    private readonly Vector256<double> v = value;

    public static int Count => 4;

    public static Lanes4 Zero => new(Vector256<double>.Zero);

    public static Lanes4 One => new(Vector256<double>.One);

    public static Lanes4 AllBitsSet => new(Vector256<double>.AllBitsSet);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 Create(double value) => new(Vector256.Create(value));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 Load(ref double source, nuint at) => new(Vector256.LoadUnsafe(ref source, at));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 Load(ReadOnlySpan<double> source) => new(Vector256.Create(source));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Store(ref double destination, nuint at) => v.StoreUnsafe(ref destination, at);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Store(Span<double> destination) => v.CopyTo(destination);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public uint Mask() => v.ExtractMostSignificantBits();

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 operator +(Lanes4 a, Lanes4 b) => new(a.v + b.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 operator -(Lanes4 a, Lanes4 b) => new(a.v - b.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 operator -(Lanes4 a) => new(-a.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 operator *(Lanes4 a, Lanes4 b) => new(a.v * b.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 operator /(Lanes4 a, Lanes4 b) => new(a.v / b.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 operator &(Lanes4 a, Lanes4 b) => new(a.v & b.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 operator |(Lanes4 a, Lanes4 b) => new(a.v | b.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 operator ^(Lanes4 a, Lanes4 b) => new(a.v ^ b.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 operator ~(Lanes4 a) => new(~a.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 Exp(Lanes4 x) => new(Vector256.Exp(x.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 Log(Lanes4 x) => new(Vector256.Log(x.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 Sqrt(Lanes4 x) => new(Vector256.Sqrt(x.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 Abs(Lanes4 x) => new(Vector256.Abs(x.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 Min(Lanes4 a, Lanes4 b) => new(Vector256.Min(a.v, b.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 Max(Lanes4 a, Lanes4 b) => new(Vector256.Max(a.v, b.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 Select(Lanes4 mask, Lanes4 whenSet, Lanes4 otherwise) => new(Vector256.ConditionalSelect(mask.v, whenSet.v, otherwise.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 LessThan(Lanes4 a, Lanes4 b) => new(Vector256.LessThan(a.v, b.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 LessThanOrEqual(Lanes4 a, Lanes4 b) => new(Vector256.LessThanOrEqual(a.v, b.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 GreaterThan(Lanes4 a, Lanes4 b) => new(Vector256.GreaterThan(a.v, b.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes4 GreaterThanOrEqual(Lanes4 a, Lanes4 b) => new(Vector256.GreaterThanOrEqual(a.v, b.v));
}

/// <summary>Eight hours to a <see cref="Vector512{T}"/>: used only where <see cref="Vector512.IsHardwareAccelerated"/>.</summary>
internal readonly struct Lanes8(Vector512<double> value) : ILanes<Lanes8>
{
    private readonly Vector512<double> v = value;

    public static int Count => 8;

    public static Lanes8 Zero => new(Vector512<double>.Zero);

    public static Lanes8 One => new(Vector512<double>.One);

    public static Lanes8 AllBitsSet => new(Vector512<double>.AllBitsSet);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 Create(double value) => new(Vector512.Create(value));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 Load(ref double source, nuint at) => new(Vector512.LoadUnsafe(ref source, at));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 Load(ReadOnlySpan<double> source) => new(Vector512.Create(source));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Store(ref double destination, nuint at) => v.StoreUnsafe(ref destination, at);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Store(Span<double> destination) => v.CopyTo(destination);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public uint Mask() => (uint)v.ExtractMostSignificantBits();

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 operator +(Lanes8 a, Lanes8 b) => new(a.v + b.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 operator -(Lanes8 a, Lanes8 b) => new(a.v - b.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 operator -(Lanes8 a) => new(-a.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 operator *(Lanes8 a, Lanes8 b) => new(a.v * b.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 operator /(Lanes8 a, Lanes8 b) => new(a.v / b.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 operator &(Lanes8 a, Lanes8 b) => new(a.v & b.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 operator |(Lanes8 a, Lanes8 b) => new(a.v | b.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 operator ^(Lanes8 a, Lanes8 b) => new(a.v ^ b.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 operator ~(Lanes8 a) => new(~a.v);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 Exp(Lanes8 x) => new(Vector512.Exp(x.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 Log(Lanes8 x) => new(Vector512.Log(x.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 Sqrt(Lanes8 x) => new(Vector512.Sqrt(x.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 Abs(Lanes8 x) => new(Vector512.Abs(x.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 Min(Lanes8 a, Lanes8 b) => new(Vector512.Min(a.v, b.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 Max(Lanes8 a, Lanes8 b) => new(Vector512.Max(a.v, b.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 Select(Lanes8 mask, Lanes8 whenSet, Lanes8 otherwise) => new(Vector512.ConditionalSelect(mask.v, whenSet.v, otherwise.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 LessThan(Lanes8 a, Lanes8 b) => new(Vector512.LessThan(a.v, b.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 LessThanOrEqual(Lanes8 a, Lanes8 b) => new(Vector512.LessThanOrEqual(a.v, b.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 GreaterThan(Lanes8 a, Lanes8 b) => new(Vector512.GreaterThan(a.v, b.v));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Lanes8 GreaterThanOrEqual(Lanes8 a, Lanes8 b) => new(Vector512.GreaterThanOrEqual(a.v, b.v));
}
