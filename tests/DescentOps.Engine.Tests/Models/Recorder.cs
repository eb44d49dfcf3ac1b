using DescentOps.Engine.Components;
using DescentOps.Records;

namespace DescentOps.Engine.Tests.Models;

/// <summary>Journals every message it gets except the start: the simplest observable target.</summary>
public sealed class Recorder(Primitives.Identity.ComponentId id) : SimComponent<int>(id)
{
    public override int InitialState => 0;

    public override int Handle(int state, object message, ComponentContext context)
    {
        if (message is not RunStarted) context.Record("recorder.got", Severity.Info, RecordField.Of("message", message.ToString() ?? ""));
        return state + 1;
    }
}
