namespace BinEnergy.Core.Economizer;

/// <summary>One thing wrong with economizer settings: the setting's key and what is wrong.</summary>
/// <param name="Key">The setting, as a snake_case key (<c>supply_temp</c>, <c>min_outdoor_airflow</c>, ...).</param>
/// <param name="Message">What is wrong and how to fix it.</param>
public sealed record EconomizerSettingsProblem(string Key, string Message);
