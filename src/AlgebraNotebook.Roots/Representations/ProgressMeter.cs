namespace AlgebraNotebook.Roots.Representations;

/// <summary>
/// Reports one stage's progress about a hundred times (and always at the end), checking cancellation at every advance and
/// right after each report, so a token cancelled from the callback stops the work at once. Thread-safe: workers may call <see cref="Advance"/> concurrently.
/// </summary>
internal sealed class ProgressMeter
{
    private readonly IProgress<RepresentationProgress>? _progress;
    private readonly CancellationToken _cancellationToken;
    private readonly string _stage;
    private readonly long _total;
    private readonly long _step;
    private long _done;
    private long _nextReport;

    public ProgressMeter(IProgress<RepresentationProgress>? progress, CancellationToken cancellationToken, string stage, long total)
    {
        _progress = progress;
        _cancellationToken = cancellationToken;
        _stage = stage;
        _total = Math.Max(total, 0);
        _step = Math.Max(1, _total / 100);
        _nextReport = _step;
        cancellationToken.ThrowIfCancellationRequested();
        progress?.Report(new RepresentationProgress(stage, 0, _total));
    }

    /// <summary>Counts <paramref name="units"/> more units done; reports and checks cancellation when a step is passed.</summary>
    public void Advance(long units = 1)
    {
        _cancellationToken.ThrowIfCancellationRequested();
        var done = Interlocked.Add(ref _done, units);
        if (done < Volatile.Read(ref _nextReport))
        {
            return;
        }

        lock (this)
        {
            if (done >= _nextReport)
            {
                _nextReport = done + _step;
                if (done < _total)
                {
                    _progress?.Report(new RepresentationProgress(_stage, done, _total));
                }
            }
        }

        _cancellationToken.ThrowIfCancellationRequested();
    }

    /// <summary>Reports the stage complete (done = total).</summary>
    public void Finish()
    {
        _cancellationToken.ThrowIfCancellationRequested();
        _progress?.Report(new RepresentationProgress(_stage, _total, _total));
    }
}
