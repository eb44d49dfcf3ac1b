using DescentOps.Mission.Procedures;

namespace DescentOps.Mission.Tests.Procedures;

/// <summary>A step's branches are its possible outcomes: every step passes; a waiting step can be late; a checking step can fail.</summary>
public sealed class ProcedureCoverageTests
{
    private static readonly CompiledProcedure Recover = ProcedureFixtures.Compile(ProcedureFixtures.FourSteps);

    [Fact]
    public void Every_branch_is_listed_with_how_often_it_was_taken()
    {
        var branches = ProcedureCoverage.Of([Recover], [("recover", "boost", StepVerdict.Passed), ("recover", "boost", StepVerdict.Passed), ("recover", "confirm", StepVerdict.Failed)]);

        // boost waits (passed, late); confirm waits and checks (passed, failed, late); report and fallback wait for nothing (passed).
        Assert.Equal(
            [("boost", StepVerdict.Passed, 2), ("boost", StepVerdict.Late, 0), ("confirm", StepVerdict.Passed, 0), ("confirm", StepVerdict.Failed, 1), ("confirm", StepVerdict.Late, 0), ("report", StepVerdict.Passed, 0), ("fallback", StepVerdict.Passed, 0)],
            branches.Select(b => (b.Step, b.Verdict, b.Taken)));
        Assert.Equal("procedure recover: 2 of 7 branches taken; never: boost late, confirm passed, confirm late, report passed, fallback passed", Assert.Single(ProcedureCoverage.Lines(branches)));
    }
}
