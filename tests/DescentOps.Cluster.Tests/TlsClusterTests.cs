using System.Security.Cryptography;
using System.Security.Cryptography.X509Certificates;
using DescentOps.Campaigns;
using Xunit;

namespace DescentOps.Cluster.Tests;

/// <summary>The README's transport security, exercised: Akka.Remote's TLS settings given through <c>--akka-config</c>.</summary>
[Collection(InProcessClusterCollection.Name)]
public sealed class TlsClusterTests
{
    [Fact]
    public async Task With_tls_settings_the_cluster_runs_over_tls()
    {
        var dir = ClusterFixture.TempDir();
        var pfx = Path.Combine(dir, "node.pfx");
        File.WriteAllBytes(pfx, SelfSigned().Export(X509ContentType.Pfx, "test-password"));
        // A self-signed certificate has no authority to check it against, so validation is suppressed here; the README's
        // settings for a real network keep it on with certificates from the operator's own authority.
        var hocon = $$"""
            akka.remote.dot-netty.tcp {
              enable-ssl = true
              ssl {
                suppress-validation = true
                certificate { path = "{{pfx}}", password = "test-password" }
              }
            }
            """;

        var plan = ClusterFixture.Plan(seed: 13, toolVersion: Cli.ToolInfo.Version);
        var stored = new List<RunRecord>();
        var setup = new DispatcherSetup(System.Text.Json.JsonSerializer.Serialize(InProcessClusterTests.Settings(plan)), plan, [new RunKey(CampaignVariant.BaselineName, 0), new RunKey(CampaignVariant.BaselineName, 1)],
            Cli.ToolInfo.Version, null, r => { lock (stored) stored.Add(r); return true; }, () => int.MaxValue, _ => { });
        await using var node = await CampaignNode.StartAsync(setup, new NodeAddress("127.0.0.1", 0), 0, _ => plan, false, _ => { }, hocon);
        Assert.Equal("akka.ssl.tcp", node.Protocol);

        await using var worker = new ClusterFixture.Worker(node.Address.Port, akkaConfig: hocon);
        await node.Completion.WaitAsync(ClusterFixture.Guard);
        Assert.Equal(2, worker.Counters.RunsDone);
        Assert.Equal(
            [.. Enumerable.Range(0, 2).Select(i => RunRecordCodec.Encode(RunExecutor.Execute(plan, plan.Spec(CampaignVariant.BaselineName, i))))],
            stored.OrderBy(r => r.Index).Select(RunRecordCodec.Encode).ToList());
    }

    private static X509Certificate2 SelfSigned()
    {
        using var key = RSA.Create(2048);
        var request = new CertificateRequest("CN=descentops-test-node", key, HashAlgorithmName.SHA256, RSASignaturePadding.Pkcs1);
        request.CertificateExtensions.Add(new X509EnhancedKeyUsageExtension([new Oid("1.3.6.1.5.5.7.3.1"), new Oid("1.3.6.1.5.5.7.3.2")], false)); // server and client authentication (RFC 5280, 4.2.1.12)
        var san = new SubjectAlternativeNameBuilder();
        san.AddIpAddress(System.Net.IPAddress.Loopback);
        request.CertificateExtensions.Add(san.Build());
        return request.CreateSelfSigned(DateTimeOffset.UtcNow.AddMinutes(-5), DateTimeOffset.UtcNow.AddDays(1));
    }
}
