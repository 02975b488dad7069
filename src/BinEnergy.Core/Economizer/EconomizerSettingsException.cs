namespace BinEnergy.Core.Economizer;

/// <summary>Economizer settings that describe no workable system; lists every problem found, each with its key.</summary>
public sealed class EconomizerSettingsException : ArgumentException
{
    public EconomizerSettingsException(IReadOnlyList<EconomizerSettingsProblem> problems)
        : base("economizer settings are not valid: " + string.Join("; ", problems.Select(p => p.Key + ": " + p.Message)))
    {
        Problems = problems;
    }

    /// <summary>Every problem found.</summary>
    public IReadOnlyList<EconomizerSettingsProblem> Problems { get; }
}
