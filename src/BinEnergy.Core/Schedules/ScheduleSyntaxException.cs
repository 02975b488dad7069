using BinEnergy.Core.Errors;

namespace BinEnergy.Core.Schedules;

/// <summary>
/// An occupancy schedule's text could not be read. The message quotes the whole text,
/// names the character position (1-based) and the fragment that is wrong, says what is
/// wrong and shows the accepted form.
/// </summary>
public sealed class ScheduleSyntaxException : InputDataException
{
    /// <summary>Creates the error for <paramref name="text"/>, pointing at <paramref name="position"/> (0-based index).</summary>
    public ScheduleSyntaxException(string text, int position, string fragment, string problem)
        : base(FormattableString.Invariant(
            $"occupancy schedule \"{text}\": at character {position + 1} ('{fragment}'): {problem}. {OccupancySchedule.SyntaxHelp}"))
    {
        Text = text;
        Position = position + 1;
        Fragment = fragment;
        Problem = problem;
    }

    /// <summary>The schedule text as given.</summary>
    public string Text { get; }

    /// <summary>Where the bad part starts, 1-based character position in <see cref="Text"/>.</summary>
    public int Position { get; }

    /// <summary>The bad part of the text.</summary>
    public string Fragment { get; }

    /// <summary>What is wrong with it.</summary>
    public string Problem { get; }
}
