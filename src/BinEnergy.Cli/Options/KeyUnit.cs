namespace BinEnergy.Cli.Options;

/// <summary>The quantity of an option's value, whose display unit gives the study key its suffix (<c>airflow</c> becomes <c>airflow_cfm</c> or <c>airflow_ls</c>).</summary>
internal enum KeyUnit
{
    /// <summary>The key carries no unit suffix (a count, a percentage named <c>_pct</c>, a word).</summary>
    None,

    /// <summary>A temperature.</summary>
    Temperature,

    /// <summary>A temperature difference (a bin width).</summary>
    TemperatureDifference,

    /// <summary>A volume flow (also a flow per person or per unit area).</summary>
    Airflow,

    /// <summary>A length (elevation).</summary>
    Length,

    /// <summary>A floor area.</summary>
    Area,

    /// <summary>A load rate.</summary>
    Power,

    /// <summary>A pressure drop.</summary>
    PressureDrop,

    /// <summary>A moist-air enthalpy.</summary>
    Enthalpy,
}
