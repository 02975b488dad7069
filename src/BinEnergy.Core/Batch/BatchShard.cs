using System.Globalization;

namespace BinEnergy.Core.Batch;

/// <summary>
/// Which of a batch's deterministic parts this process runs: the <paramref name="Index"/>-th (from 0) of
/// <paramref name="Count"/>, taking every <paramref name="Count"/>-th station of the sorted inputs from
/// <paramref name="Index"/> on, so the parts are about the same size and their union is the whole batch.
/// </summary>
/// <param name="Index">This part, 0 to Count - 1.</param>
/// <param name="Count">How many parts.</param>
/// <param name="Origin">Where the part came from, for the log: <c>--shard</c>, a Slurm array or a Kubernetes Indexed Job.</param>
public sealed record BatchShard(int Index, int Count, string Origin)
{
    /// <summary>The whole batch in one part.</summary>
    public static BatchShard Whole { get; } = new(0, 1, "the whole batch");

    /// <summary>Whether the station at <paramref name="position"/> of the sorted inputs is in this part.</summary>
    public bool Holds(int position) => position % Count == Index;

    /// <summary>
    /// The part to run: <c>--shard I/N</c> when given; else a Slurm job array's task
    /// (<c>SLURM_ARRAY_TASK_ID</c> less <c>SLURM_ARRAY_TASK_MIN</c>, of <c>SLURM_ARRAY_TASK_COUNT</c> or MAX - MIN + 1);
    /// else a Kubernetes Indexed Job's <c>JOB_COMPLETION_INDEX</c> of <paramref name="shards"/> (<c>--shards N</c>); else the whole batch.
    /// </summary>
    /// <exception cref="BatchInputException">The option or the variables do not give a part (the message names them).</exception>
    public static BatchShard Choose(string? shard, int? shards, Func<string, string?> environment)
    {
        if (shard is not null)
        {
            var p = shard.Split('/');
            if (p.Length != 2 || !int.TryParse(p[0], NumberStyles.None, CultureInfo.InvariantCulture, out int i) || !int.TryParse(p[1], NumberStyles.None, CultureInfo.InvariantCulture, out int n) || n < 1 || i >= n)
            {
                throw new BatchInputException($"--shard '{shard}' is not a part I/N with 0 <= I < N, such as 0/4 (the first of four)");
            }

            return new BatchShard(i, n, "--shard " + shard);
        }

        if (environment("SLURM_ARRAY_TASK_ID") is string id)
        {
            int task = WholeNumber("SLURM_ARRAY_TASK_ID", id);
            int min = environment("SLURM_ARRAY_TASK_MIN") is string mn ? WholeNumber("SLURM_ARRAY_TASK_MIN", mn) : 0;
            int count = environment("SLURM_ARRAY_TASK_COUNT") is string c ? WholeNumber("SLURM_ARRAY_TASK_COUNT", c)
                : environment("SLURM_ARRAY_TASK_MAX") is string mx ? WholeNumber("SLURM_ARRAY_TASK_MAX", mx) - min + 1
                : throw new BatchInputException("SLURM_ARRAY_TASK_ID is set but neither SLURM_ARRAY_TASK_COUNT nor SLURM_ARRAY_TASK_MAX is: run under a Slurm job array (sbatch --array=0-3), or give --shard I/N");
            return Checked(task - min, count, FormattableString.Invariant($"the Slurm array task {task} (array {min} to {min + count - 1})"));
        }

        if (environment("JOB_COMPLETION_INDEX") is string k)
        {
            int index = WholeNumber("JOB_COMPLETION_INDEX", k);
            return shards is int n
                ? Checked(index, n, FormattableString.Invariant($"the Kubernetes Indexed Job's completion index {index} of --shards {n}"))
                : throw new BatchInputException("JOB_COMPLETION_INDEX is set (a Kubernetes Indexed Job): give --shards N, the job's completions, so the index has a count");
        }

        return shards is int only and > 1
            ? throw new BatchInputException("--shards N needs a Kubernetes Indexed Job's JOB_COMPLETION_INDEX; give --shard I/N to run one part by hand")
            : Whole;
    }

    private static BatchShard Checked(int index, int count, string origin) =>
        count >= 1 && index >= 0 && index < count ? new BatchShard(index, count, origin)
            : throw new BatchInputException(FormattableString.Invariant($"{origin} gives part {index} of {count}, which is not a part (0 to count - 1)"));

    private static int WholeNumber(string variable, string value) =>
        int.TryParse(value.Trim(), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out int v) ? v
            : throw new BatchInputException($"{variable} is '{value}', not a whole number");
}
