using BinEnergy.Core.Units;

namespace BinEnergy.Core.Study;

/// <summary>
/// One spelling of a study key with its unit, e.g. <c>airflow_cfm</c> or <c>airflow_ls</c>,
/// and how its value becomes SI. For [temperature, value] pairs, <see cref="PointX"/> converts
/// the temperature (the display unit of the study for a key without a temperature suffix).
/// </summary>
internal sealed record KeyAlternative(string Key, string Unit, Func<double, UnitSystem, double> ToSi, Func<double, UnitSystem, double>? PointX = null);
