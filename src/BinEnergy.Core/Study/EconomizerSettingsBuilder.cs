using BinEnergy.Core.Loads;
using BinEnergy.Core.Schedules;

namespace BinEnergy.Core.Study;

/// <summary>Builds the economizer settings of a variant's [economizer] table (null when there is none or it is disabled).</summary>
internal static class EconomizerSettingsBuilder
{
    public static Economizer.EconomizerSettings? Build(StudySection e, OutdoorAirSettings outdoorAir, OccupancySchedule schedule, List<string> assumptions)
    {
        if (!e.Present || e.Bool("enabled") == false)
        {
            return null;
        }

        throw new StudyFileException(e.File, e.Line, "economizer", "the economizer evaluation is not available in this build yet; remove the [economizer] table");
    }
}
