using System.Threading.Channels;
using BinEnergy.Core.Errors;
using BinEnergy.Core.Study;

namespace BinEnergy.Core.Batch;

/// <summary>
/// Runs a study's variants on many weather files: one file per worker on every core (<see cref="Parallel.ForEach{TSource}(IEnumerable{TSource}, ParallelOptions, Action{TSource})"/>),
/// each file read once (<see cref="StudyRunner.ReadWeather"/>) and run through <see cref="StudyRunner.RunCase"/> per variant. Results go
/// through a bounded channel to the caller's thread, one file at a time and in the order they finish; once the
/// caller's handler returns, nothing keeps the file's weather or results, so memory is flat in the number of files
/// (at most the workers' files and the channel's few are alive at once).
/// </summary>
public static class BatchRunner
{
    /// <summary>
    /// Runs <paramref name="stations"/> (each with its position in the sorted inputs); <paramref name="handle"/> is
    /// called on the calling thread with each file's result as it finishes.
    /// </summary>
    /// <param name="study">The study (its variants; its climates are ignored).</param>
    /// <param name="stations">The inputs to run, with their positions.</param>
    /// <param name="handle">Takes each result (writes its rows); an exception stops the run and is rethrown.</param>
    /// <param name="workers">Files run at once; default every core.</param>
    /// <param name="ct">Cancels between files.</param>
    /// <exception cref="StudyFileException">A variant of the study is not valid (before any file is read).</exception>
    public static void Run(StudyDefinition study, IReadOnlyList<(BatchStation Station, int Position)> stations, Action<BatchFileResult> handle,
        int? workers = null, CancellationToken ct = default)
    {
        var variants = Variants(study);
        ForEachFile(stations, s => RunOne(study, variants, s.Station, s.Position), handle, workers, ct);
    }

    /// <summary>The study's variants as cases of a placeholder climate (each file's own climate replaces it): checks every variant before any file is read.</summary>
    /// <exception cref="StudyFileException">A variant of the study is not valid.</exception>
    public static IReadOnlyList<StudyCase> Variants(StudyDefinition study) =>
        StudyCaseBuilder.Build(study with { Climates = [new StudyClimate("batch", string.Empty, null, null, 0)] });

    /// <summary>
    /// The engine's pipeline: <paramref name="work"/> on every item, one item per worker on <paramref name="workers"/> cores
    /// (default every core), and <paramref name="handle"/> on the calling thread with each result as it finishes, through
    /// a channel that holds at most one result per worker, so finished results wait for the handler, not pile up.
    /// </summary>
    /// <remarks>An exception from <paramref name="work"/> or <paramref name="handle"/> stops the other workers and is rethrown (the first one, unwrapped).</remarks>
    public static void ForEachFile<TItem, TResult>(IReadOnlyList<TItem> items, Func<TItem, TResult> work, Action<TResult> handle, int? workers = null, CancellationToken ct = default)
    {
        int n = Math.Max(1, Math.Min(workers ?? Environment.ProcessorCount, Math.Max(1, items.Count)));
        var channel = Channel.CreateBounded<TResult>(new BoundedChannelOptions(n) { SingleReader = true, FullMode = BoundedChannelFullMode.Wait });
        using var stop = CancellationTokenSource.CreateLinkedTokenSource(ct);
        var producer = Task.Run(() =>
        {
            try
            {
                Parallel.ForEach(items, new ParallelOptions { MaxDegreeOfParallelism = n, CancellationToken = stop.Token },
                    item => channel.Writer.WriteAsync(work(item), stop.Token).AsTask().GetAwaiter().GetResult());
                channel.Writer.Complete();
            }
            catch (Exception e)
            {
                channel.Writer.Complete(e is AggregateException a ? a.Flatten().InnerExceptions.FirstOrDefault(x => x is not OperationCanceledException) ?? a.InnerExceptions[0] : e);
            }
        }, CancellationToken.None);

        try
        {
            var reader = channel.Reader;
            while (reader.WaitToReadAsync(CancellationToken.None).AsTask().GetAwaiter().GetResult())
            {
                while (reader.TryRead(out var result))
                {
                    handle(result);
                }
            }
        }
        catch (ChannelClosedException e) when (e.InnerException is not null)
        {
            System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(e.InnerException).Throw();
        }
        finally
        {
            stop.Cancel();
            try
            {
                producer.GetAwaiter().GetResult();
            }
            catch (OperationCanceledException)
            {
            }
        }

        ct.ThrowIfCancellationRequested();
    }

    /// <summary>
    /// Reads one file and runs every variant on it. An input error (missing or unreadable file, bad data, a study value
    /// the climate cannot take) stops only this file and comes back as its problem; anything else is a bug and stops the run.
    /// </summary>
    public static BatchFileResult RunOne(StudyDefinition study, IReadOnlyList<StudyCase> variants, BatchStation station, int position)
    {
        var climate = new StudyClimate(station.Key, station.WeatherPath, station.Map, station.ElevationM, station.Line ?? 0);
        try
        {
            var weather = StudyRunner.ReadWeather(climate);
            climate = climate with { Name = station.NameFor(weather.Site.Name) };
            var cases = variants.Select(v => StudyRunner.RunCase(v with { Climate = climate }, weather, study.HeadlineMethod)).ToList();
            var cautions = cases.SelectMany(c => c.Warnings).Distinct(StringComparer.Ordinal)
                .Select(w => new BatchProblem(climate.Name, station.WeatherPath, null, BatchProblemKinds.OfCaution(w), w, false)).ToList();
            return new BatchFileResult(station, position, climate.Name, cases, cautions);
        }
        catch (InputDataException e)
        {
            int? line = e switch
            {
                Weather.WeatherDataException w => w.Line,
                StudyFileException s => s.Line,
                _ => null,
            };
            // A problem on no line of the weather file (the file is missing, say) is placed at the station list's row, when there is one.
            var problem = line is null && station.Line is int row
                ? new BatchProblem(station.ListedName ?? station.Id, station.Source, row, BatchProblemKinds.Of(e), e.Message, true)
                : new BatchProblem(station.ListedName ?? station.Id, station.WeatherPath, line, BatchProblemKinds.Of(e), e.Message, true);
            return new BatchFileResult(station, position, station.ListedName ?? station.Id, [], [problem]);
        }
        catch (IOException e)
        {
            var problem = new BatchProblem(station.ListedName ?? station.Id, station.WeatherPath, null, BatchProblemKinds.UnreadableFile, $"{station.WeatherPath}: {e.Message}", true);
            return new BatchFileResult(station, position, station.ListedName ?? station.Id, [], [problem]);
        }
    }
}
