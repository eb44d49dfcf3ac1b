using DescentOps.Journal;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Reports;

/// <summary>
/// The shared link home's figures in a run with landers: its channels, the frames it carried and their time on the
/// air (so its use: air time over channels times the run), and the most channels busy at once.
/// </summary>
public sealed class SharedLinkFigures
{
    public long Channels { get; private set; }

    public string Policy { get; private set; } = "";

    public long FramesCarried { get; private set; }

    public double AirTimeS { get; private set; }

    public long MostBusy { get; private set; }

    /// <summary>Share of the channels' time spent carrying frames over <paramref name="lengthS"/>.</summary>
    public double Use(double lengthS) => Channels > 0 && lengthS > 0 ? AirTimeS / (Channels * lengthS) : 0.0;

    internal void Add(EventEntry e)
    {
        switch (e.Kind)
        {
            case LinkRecords.Started:
                foreach (var f in e.Data)
                {
                    if (f.Name == "channels") Channels = f.Integer;
                    if (f.Name == "policy") Policy = f.Text ?? "";
                }

                break;
            case LinkRecords.Sent:
                FramesCarried++;
                foreach (var f in e.Data)
                {
                    if (f.Name == "on_air_s" && f.Kind == RecordFieldKind.Number) AirTimeS += f.Number;
                    if (f.Name == "channels_busy") MostBusy = Math.Max(MostBusy, f.Integer);
                }

                break;
        }
    }
}
