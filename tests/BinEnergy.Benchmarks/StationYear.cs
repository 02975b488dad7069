using System.Globalization;
using System.Text;
using BinEnergy.Core.Weather;

namespace BinEnergy.Benchmarks;

/// <summary>The station-year the benchmarks read: the Chicago TMY3 check file, converted once to the open layout.</summary>
internal static class StationYear
{
    /// <summary>The open-layout bytes (time, drybulb_c, dewpoint_c, rh_pct, pressure_kpa), 8,760 rows.</summary>
    public static byte[] ChicagoOpenLayout()
    {
        string root = AppContext.BaseDirectory;
        while (!File.Exists(Path.Combine(root, "BinEnergy.sln")))
        {
            root = Path.GetDirectoryName(root) ?? throw new InvalidOperationException("BinEnergy.sln not found");
        }

        string source = Path.Combine(root, "tests", "data", "weather-open", "725300TYA.CSV.gz");
        var weather = WeatherReader.Read(source, new WeatherReadOptions { Map = ColumnMap.Load("tmy3") });
        var text = new StringWriter(CultureInfo.InvariantCulture) { NewLine = "\n" };
        OpenLayoutWriter.Write(weather, text);
        return Encoding.UTF8.GetBytes(text.ToString());
    }
}
