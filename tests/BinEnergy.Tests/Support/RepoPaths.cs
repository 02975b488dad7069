namespace BinEnergy.Tests.Support;

/// <summary>Paths inside the repository, found from the test assembly's location.</summary>
public static class RepoPaths
{
    /// <summary>The repository root (the folder holding BinEnergy.sln).</summary>
    public static string Root { get; } = FindRoot();

    /// <summary>tests/reference: the npm reference packages and the scripts that call them.</summary>
    public static string Reference => Path.Combine(Root, "tests", "reference");

    /// <summary>tests/data: the test data with its provenance README.</summary>
    public static string Data => Path.Combine(Root, "tests", "data");

    private static string FindRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "BinEnergy.sln")))
        {
            dir = dir.Parent;
        }

        return dir?.FullName ?? throw new InvalidOperationException("cannot find BinEnergy.sln above " + AppContext.BaseDirectory);
    }
}
