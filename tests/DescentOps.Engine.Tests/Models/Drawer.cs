using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests.Models;

/// <summary>Draws from its own random stream once a second and journals each draw.</summary>
public sealed class Drawer(ComponentId id, int draws) : SimComponent<int>(id)
{
    public override int InitialState => 0;

    public override int Handle(int state, object message, ComponentContext context)
    {
        if (message is not (RunStarted or string)) throw new InvalidOperationException($"drawer got {message}");
        if (message is string)
        {
            context.Record("drawer.draw", Severity.Debug, RecordField.Of("u", context.Random.NextUniform()), RecordField.Of("k", context.Random.NextInt(0, 1000)));
        }

        if (state < draws) context.ScheduleSelf(SimDuration.FromSeconds(1), "draw");
        return state + 1;
    }
}
