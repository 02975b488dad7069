namespace BinEnergy.Core.Loads;

/// <summary>One value per integration method: the hourly sum, joint bins and the bin method.</summary>
/// <typeparam name="T">What each method gives (a year's figures, a bin's, a month's).</typeparam>
/// <param name="Hourly">By the hourly sum.</param>
/// <param name="JointBin">By joint dry-bulb x humidity-ratio bins.</param>
/// <param name="Bin">By the classic dry-bulb bin method.</param>
public readonly record struct ByMethod<T>(T Hourly, T JointBin, T Bin)
{
    /// <summary>The value of one method.</summary>
    public T this[IntegrationMethod method] => method switch
    {
        IntegrationMethod.Hourly => Hourly,
        IntegrationMethod.JointBin => JointBin,
        IntegrationMethod.Bin => Bin,
        _ => throw new ArgumentOutOfRangeException(nameof(method), method, "unknown method"),
    };

    /// <summary>Each method's value mapped through <paramref name="map"/>.</summary>
    public ByMethod<TResult> Select<TResult>(Func<T, TResult> map) => new(map(Hourly), map(JointBin), map(Bin));
}
