namespace BinEnergy.Tests.Study;

/// <summary>
/// A study file of the reference office system of docs/economizer.md (invented: 10,000 cfm,
/// 2,000 cfm outdoor air, 55 F supply, 75 F / 50 % return, 216,000 Btu/h at 95 F from a 50 F
/// balance point, office hours) on one real check file through the tmy3 map, comparing the
/// differential-enthalpy economizer, with the caller's [plant] lines.
/// </summary>
internal static class ReferenceOfficeStudy
{
    /// <summary>The study text.</summary>
    /// <param name="weatherPath">The check file (absolute path).</param>
    /// <param name="economizerLines">Extra [economizer] lines, e.g. supply_airflow_min_cfm = 3000.</param>
    /// <param name="plantLines">The [plant] lines.</param>
    public static string Text(string weatherPath, string economizerLines, string plantLines) => $"""
        [study]
        name = "reference office"
        units = "ip"
        [[climate]]
        name = "{Path.GetFileName(weatherPath).Split('.')[0]}"
        weather = "{weatherPath.Replace("\\", "/", StringComparison.Ordinal)}"
        map = "tmy3"
        [schedule]
        occupied = "Mon-Fri 07:00-19:00"
        [ventilation]
        airflow_cfm = 2000
        heat_to_f = 75
        cool_to_f = 75
        max_rh_pct = 50
        [economizer]
        supply_airflow_cfm = 10000
        min_outdoor_airflow_cfm = 2000
        supply_temp_f = 55
        return_temp_f = 75
        return_rh_pct = 50
        design_load_btuh = 216000
        design_outdoor_f = 95
        balance_point_f = 50
        controls = ["differential-enthalpy"]
        {economizerLines}
        [plant]
        {plantLines}
        """;
}
