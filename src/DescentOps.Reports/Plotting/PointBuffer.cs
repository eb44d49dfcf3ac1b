namespace DescentOps.Reports.Plotting;

/// <summary>
/// Appends doubles in fixed chunks: a growing list would copy its whole array at each doubling and hold the
/// old and new arrays at once, twice the memory of the points at the worst moment of a year-long log.
/// </summary>
internal sealed class PointBuffer
{
    private const int ChunkSize = 16_384;
    private readonly List<double[]> _chunks = [];
    private int _inLast = ChunkSize;

    public int Count { get; private set; }

    public void Add(double value)
    {
        if (_inLast == ChunkSize)
        {
            _chunks.Add(new double[ChunkSize]);
            _inLast = 0;
        }

        _chunks[^1][_inLast++] = value;
        Count++;
    }

    public double[] ToArray()
    {
        var result = new double[Count];
        var at = 0;
        foreach (var chunk in _chunks)
        {
            var n = Math.Min(ChunkSize, Count - at);
            Array.Copy(chunk, 0, result, at, n);
            at += n;
        }

        return result;
    }
}
