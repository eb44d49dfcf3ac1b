using DescentOps.Mission.Procedures;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests.Procedures;

/// <summary>Procedures written into the default scenario and compiled as a run compiles them.</summary>
internal static class ProcedureFixtures
{
    /// <summary>The default scenario with <paramref name="block"/> (a <c>procedures:</c> section) before its run settings.</summary>
    public static Scenario WithProcedures(string block, params (string Line, string Replacement)[] edits) =>
        MissionHarness.Edited([("\nrun:\n", "\n" + block.TrimEnd() + "\n\nrun:\n"), .. edits]);

    public static CompiledProcedure Compile(string block) => Assert.Single(MissionProcedures.Compile(WithProcedures(block)));

    /// <summary>Four steps: send and wait, wait with a check, a step that waits for nothing, and a fallback.</summary>
    public const string FourSteps = """
        procedures:
          - name: recover
            steps:
              - name: boost
                send: probe.wall set_power(power = 3 kW)
                wait_for: probe.wall_power above 2.5 kW
                within: 3 h
                on_fail: fallback
              - name: confirm
                wait_for: probe.regime is Melting for 2 samples
                within: 1 d
                expect: probe.head_power above 1 kW
                on_fail: fallback
              - name: report
                on_pass: done
              - name: fallback
                send: probe enter_safe_mode
                on_pass: abort
        """;
}
