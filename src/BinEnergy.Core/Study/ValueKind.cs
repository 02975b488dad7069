namespace BinEnergy.Core.Study;

/// <summary>What a study key holds.</summary>
internal enum ValueKind
{
    /// <summary>One number, converted to SI by the key's unit suffix.</summary>
    Number,

    /// <summary>Text (a name, a path, a schedule).</summary>
    Text,

    /// <summary>One of a fixed set of words.</summary>
    Choice,

    /// <summary>true or false.</summary>
    Bool,

    /// <summary>A list of words or dates.</summary>
    TextList,

    /// <summary>A list of numbers (e.g. 24 hourly fractions).</summary>
    NumberList,

    /// <summary>One number (a constant) or a list of [outdoor temperature, value] pairs.</summary>
    NumberOrPoints,
}
