using System.Diagnostics;

namespace PhaseSlope.Cli.Output;

/// <summary>A progress bar on standard error for long Monte Carlo runs: drawn only when standard
/// error is a terminal (<see cref="CliIo.ErrorIsTerminal"/>) and only once the run has taken
/// longer than <see cref="Delay"/>, so short runs, tests and CI never see it.</summary>
internal sealed class ProgressBar : IProgress<int>, IDisposable
{
    /// <summary>How long a run goes before the bar appears.</summary>
    public static readonly TimeSpan Delay = TimeSpan.FromSeconds(1);

    private readonly TextWriter? _error;
    private readonly int _total;
    private readonly string _what;
    private readonly Stopwatch _clock = Stopwatch.StartNew();
    private readonly Lock _gate = new();
    private int _shownPercent = -1;
    private bool _drawn;

    public ProgressBar(CliIo io, int total, string what)
    {
        _error = io.ErrorIsTerminal ? io.Error : null;
        _total = total;
        _what = what;
    }

    public void Report(int value)
    {
        if (_error is null || _clock.Elapsed < Delay)
        {
            return;
        }

        int percent = (int)(100L * value / Math.Max(_total, 1));
        lock (_gate)
        {
            if (percent <= _shownPercent)
            {
                return;
            }

            _shownPercent = percent;
            int filled = percent / 4;
            _error.Write($"\r{_what} [{new string('#', filled)}{new string('.', 25 - filled)}] {percent,3} %");
            _error.Flush();
            _drawn = true;
        }
    }

    public void Dispose()
    {
        lock (_gate)
        {
            if (_drawn)
            {
                // Clear the line so that what follows on stderr starts clean.
                _error!.Write($"\r{new string(' ', _what.Length + 36)}\r");
                _error.Flush();
            }
        }
    }
}
