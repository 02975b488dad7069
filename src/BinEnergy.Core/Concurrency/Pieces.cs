using System.Runtime.ExceptionServices;

namespace BinEnergy.Core.Concurrency;

/// <summary>
/// Runs the pieces of one job on whichever core is free (<see cref="Parallel.For(int, int, Action{int})"/>), so that a
/// core that starts late costs its share rather than a fixed half. Every piece runs to its end; the error raised, if
/// any, is the one of the first piece in order that failed, as one pass in order would have raised it.
/// </summary>
internal static class Pieces
{
    /// <summary>Runs <paramref name="piece"/> for 0 .. <paramref name="count"/> - 1 on all cores.</summary>
    public static void Run(int count, Action<int> piece)
    {
        var errors = new Exception?[count];
        Parallel.For(0, count, k =>
        {
            try
            {
                piece(k);
            }
            catch (Exception e)
            {
                errors[k] = e;
            }
        });

        if (Array.Find(errors, e => e is not null) is { } first)
        {
            ExceptionDispatchInfo.Throw(first);
        }
    }
}
