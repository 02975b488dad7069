using BenchmarkDotNet.Running;

namespace BinEnergy.Benchmarks;

/// <summary>
/// Runs the benchmarks: <c>dotnet run -c Release --project tests/BinEnergy.Benchmarks</c>
/// (add <c>-- --job short</c> for a quick run). Not part of test.sh.
/// </summary>
public static class Program
{
    public static void Main(string[] args) => BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
}
