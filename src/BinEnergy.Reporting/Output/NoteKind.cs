namespace BinEnergy.Reporting.Output;

/// <summary>What a line of prose in a result document is.</summary>
public enum NoteKind
{
    /// <summary>How to read the results.</summary>
    Note,

    /// <summary>An assumption behind the numbers.</summary>
    Assumption,

    /// <summary>Something about these inputs the user should look at.</summary>
    Warning,

    /// <summary>The cautions every output carries (DESIGN 13).</summary>
    Caution,
}
