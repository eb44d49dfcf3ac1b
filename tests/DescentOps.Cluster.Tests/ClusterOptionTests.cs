using Xunit;

namespace DescentOps.Cluster.Tests;

/// <summary>Cluster options that cannot work are refused before anything runs or listens, naming the option.</summary>
public sealed class ClusterOptionTests
{
    [Theory]
    [InlineData("--listen 10.20.30.40:4053", "shared secret")] // parsed and refused, never bound
    [InlineData("--listen localhost", "HOST:PORT")]
    [InlineData("--keep-logs all", "--keep-logs")]
    [InlineData("--jobs -1", "--jobs")]
    [InlineData("--akka-config /no/such/file.conf", "--akka-config")]
    public async Task A_bad_clustered_campaign_is_refused_and_leaves_nothing(string extra, string message)
    {
        var dir = Path.Combine(ClusterFixture.TempDir(), "out");
        var (exit, _, stderr) = await ClusterFixture.CliAsync(["campaign", ClusterFixture.Scenario, "--runs", "2", "--cluster", "--output", dir, .. extra.Split(' ')]);
        Assert.Equal(2, exit);
        Assert.Contains(message, stderr, StringComparison.Ordinal);
        Assert.False(Directory.Exists(dir));
    }

    [Fact]
    public async Task Cluster_options_without_cluster_are_refused()
    {
        var (exit, _, stderr) = await ClusterFixture.CliAsync("campaign", ClusterFixture.Scenario, "--runs", "2", "--listen", "127.0.0.1:4053", "--output", Path.Combine(ClusterFixture.TempDir(), "out"));
        Assert.Equal(2, exit);
        Assert.Contains("go with --cluster", stderr, StringComparison.Ordinal);
        (exit, _, stderr) = await ClusterFixture.CliAsync("campaign", ClusterFixture.Scenario, "--runs", "2", "--jobs", "0", "--output", Path.Combine(ClusterFixture.TempDir(), "out"));
        Assert.Equal(2, exit);
        Assert.Contains("--jobs", stderr, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--join 10.20.30.40:4053", "--listen")]
    [InlineData("--join 127.0.0.1:4053 --listen 10.20.30.40:0", "shared secret")]
    [InlineData("--join nowhere", "HOST:PORT")]
    [InlineData("--join 127.0.0.1:4053 --jobs 0", "--jobs")]
    public async Task A_bad_worker_is_refused_before_it_joins(string arguments, string message)
    {
        var (exit, _, stderr) = await ClusterFixture.CliAsync(["worker", .. arguments.Split(' ')]);
        Assert.Equal(2, exit);
        Assert.Contains(message, stderr, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("akka.remote.dot-netty.tcp.port = ${no.such.setting}")]
    [InlineData("akka.remote = = =")]
    public void An_Akka_config_file_that_is_not_hocon_is_refused_naming_it(string bad)
    {
        var file = Path.Combine(ClusterFixture.TempDir(), "tls.conf");
        File.WriteAllText(file, bad);
        Assert.Contains("tls.conf", Assert.Throws<FormatException>(() => ClusterConfig.ReadUserConfig(file)).Message, StringComparison.Ordinal);
        File.WriteAllText(file, "akka.remote.dot-netty.tcp.enable-ssl = false\n");
        Assert.Contains("enable-ssl", ClusterConfig.ReadUserConfig(file), StringComparison.Ordinal);
    }
}
