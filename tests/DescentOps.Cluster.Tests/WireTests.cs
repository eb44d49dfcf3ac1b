using DescentOps.Campaigns;
using Xunit;

namespace DescentOps.Cluster.Tests;

public sealed class WireTests
{
    [Fact]
    public void A_run_record_crosses_the_wire_bit_for_bit()
    {
        var plan = ClusterFixture.Plan(seed: 7);
        var record = RunExecutor.Execute(plan, plan.Spec(CampaignVariant.BaselineName, 1));
        var json = RunRecordCodec.Encode(record);
        var back = RunRecordCodec.Decode(json);
        Assert.Equal(json, RunRecordCodec.Encode(back));
        Assert.Equal(BitConverter.DoubleToInt64Bits(record.FinalDepthM), BitConverter.DoubleToInt64Bits(back.FinalDepthM));
        Assert.Equal(BitConverter.DoubleToInt64Bits(record.EnergyUsedJ), BitConverter.DoubleToInt64Bits(back.EnergyUsedJ));
        Assert.Equal(record.Inputs, back.Inputs);
        Assert.Equal(record.Criteria, back.Criteria);
        Assert.Equal(record.Faults, back.Faults);
        Assert.Equal(record.RuleFirings, back.RuleFirings);
        Assert.NotEmpty(back.RuleFirings);

        // Not-a-number and infinities survive too (a figure a model could produce).
        var odd = record with { EnergyUsedJ = double.NaN, TimeBlindS = double.PositiveInfinity, BreakthroughTimeS = null };
        var oddBack = RunRecordCodec.Decode(RunRecordCodec.Encode(odd));
        Assert.True(double.IsNaN(oddBack.EnergyUsedJ));
        Assert.Equal(double.PositiveInfinity, oddBack.TimeBlindS);
        Assert.Null(oddBack.BreakthroughTimeS);
    }

    [Theory]
    [InlineData("not json")]
    [InlineData("{}")]
    [InlineData("null")]
    [InlineData("{\"Variant\":\"baseline\"}")]
    public void A_malformed_record_is_refused(string json) => Assert.Throws<InvalidDataException>(() => RunRecordCodec.Decode(json));

    [Fact]
    public void An_oversized_record_is_refused_before_it_is_read() =>
        Assert.Contains("at most", Assert.Throws<InvalidDataException>(() => RunRecordCodec.Decode(new string(' ', RunRecordCodec.MaxChars + 1))).Message, StringComparison.Ordinal);

    [Theory]
    [InlineData("127.0.0.1:4053", "127.0.0.1", 4053, true)]
    [InlineData("localhost:0", "localhost", 0, true)]
    [InlineData("[::1]:7000", "::1", 7000, true)]
    [InlineData("127.8.9.10:1", "127.8.9.10", 1, true)] // all of 127.0.0.0/8 is loopback (RFC 1122, 3.2.1.3)
    [InlineData("10.1.2.3:4053", "10.1.2.3", 4053, false)]
    [InlineData("node-7.example:4053", "node-7.example", 4053, false)]
    public void An_address_is_read_and_its_reach_is_known(string text, string host, int port, bool loopback)
    {
        var address = NodeAddress.Parse(text, "--listen");
        Assert.Equal(host, address.Host);
        Assert.Equal(port, address.Port);
        Assert.Equal(loopback, address.IsLoopback);
    }

    [Theory]
    [InlineData("4053")]
    [InlineData("127.0.0.1:")]
    [InlineData("127.0.0.1:70000")]
    [InlineData("::1:4053")]
    [InlineData(":4053")]
    [InlineData("127.0.0.1:-1")]
    public void A_bad_address_is_refused_naming_the_option(string text) =>
        Assert.StartsWith("--join:", Assert.Throws<FormatException>(() => NodeAddress.Parse(text, "--join")).Message, StringComparison.Ordinal);

    [Fact]
    public void The_secrets_proof_is_HMAC_SHA256()
    {
        // RFC 4231 (HMAC-SHA-256 test vectors), test case 2: key "Jefe", data "what do ya want for nothing?".
        var secret = JoinSecret.FromText("Jefe");
        const string expected = "5BDCC146BF60754E6A042426089575C75A003F089D2739839DEC58B964EC3843";
        Assert.Equal(expected, secret.Prove("what do ya want for nothing?"));
        Assert.True(secret.Verify("what do ya want for nothing?", expected.ToLowerInvariant()));
        Assert.False(JoinSecret.FromText("jefe").Verify("what do ya want for nothing?", expected));
        Assert.False(secret.Verify("another nonce", expected));
        Assert.NotEqual(JoinSecret.NewNonce(), JoinSecret.NewNonce());
    }

    [Fact]
    public void A_secret_comes_from_a_file_or_the_environment_and_must_be_long_enough()
    {
        var dir = ClusterFixture.TempDir();
        var file = Path.Combine(dir, "secret");
        File.WriteAllText(file, "a-long-enough-shared-secret\n");
        var fromFile = JoinSecret.Load(file, _ => null)!;
        Assert.True(fromFile.Verify("n", JoinSecret.FromText("a-long-enough-shared-secret").Prove("n"))); // the line break is not part of it
        Assert.NotNull(JoinSecret.Load(null, name => name == JoinSecret.EnvironmentVariable ? "another-long-shared-secret" : null));
        Assert.Null(JoinSecret.Load(null, _ => null));
        File.WriteAllText(file, "short");
        Assert.Contains("at least 16", Assert.Throws<FormatException>(() => JoinSecret.Load(file, _ => null)).Message, StringComparison.Ordinal);
        Assert.Contains("no such file", Assert.Throws<FormatException>(() => JoinSecret.Load(Path.Combine(dir, "absent"), _ => null)).Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_result_is_stored_only_if_it_is_the_run_it_claims_with_the_plans_seed()
    {
        var plan = ClusterFixture.Plan(seed: 3);
        var record = RunExecutor.Execute(plan, plan.Spec(CampaignVariant.BaselineName, 2));
        var json = RunRecordCodec.Encode(record);
        Assert.Equal(json, RunRecordCodec.Encode(ResultCheck.Validate(plan, new RunKey(CampaignVariant.BaselineName, 2), json)));

        Assert.Contains("not of baseline#1", Assert.Throws<InvalidDataException>(() => ResultCheck.Validate(plan, new RunKey(CampaignVariant.BaselineName, 1), json)).Message, StringComparison.Ordinal);
        Assert.Contains("not in this campaign", Assert.Throws<InvalidDataException>(() => ResultCheck.Validate(plan, new RunKey("no-such-variant", 2), json)).Message, StringComparison.Ordinal);
        Assert.Contains("not in this campaign", Assert.Throws<InvalidDataException>(() => ResultCheck.Validate(plan, new RunKey(CampaignVariant.BaselineName, -1), json)).Message, StringComparison.Ordinal);
        var forged = RunRecordCodec.Encode(record with { Seed = record.Seed + 1 });
        Assert.Contains("not the run's seed", Assert.Throws<InvalidDataException>(() => ResultCheck.Validate(plan, new RunKey(CampaignVariant.BaselineName, 2), forged)).Message, StringComparison.Ordinal);
    }
}
