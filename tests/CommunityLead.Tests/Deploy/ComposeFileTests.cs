using System.Data.Common;
using System.Text.RegularExpressions;
using CommunityLead.Api.Features.LabResults;
using YamlDotNet.RepresentationModel;

namespace CommunityLead.Tests.Deploy;

/// <summary>
/// No container engine runs where the suite runs, so the compose file is checked as data: the promises
/// deploy/README.md makes about it (ports on loopback only, data on named volumes, two instances on one
/// health-checked PostgreSQL behind a balancer) hold in the file itself.
/// </summary>
public class ComposeFileTests
{
    private const string Profile = "postgres";
    private static readonly ComposeFile Compose = ComposeFile.Load(RepoFiles.PathOf("docker-compose.yml"));

    private static IEnumerable<ComposeService> InProfile => Compose.Services.Where(s => s.Profiles.Contains(Profile));
    private static ComposeService Db => InProfile.Single(s => s.Image?.StartsWith("postgres:") == true);
    private static ComposeService Balancer => InProfile.Single(s => s.Image?.StartsWith("nginx:") == true);
    private static IReadOnlyList<ComposeService> Instances => [.. InProfile.Where(s => s.Dockerfile == "deploy/Dockerfile")];

    [Fact]
    public void Compose_File_ParsesAsOneDocumentWithServicesAndVolumes()
    {
        var compose = ComposeFile.Load(RepoFiles.PathOf("docker-compose.yml"));
        Assert.NotEmpty(compose.Services);
        Assert.NotEmpty(compose.DeclaredVolumes);
    }

    [Fact]
    public void Compose_DefaultService_HasNoProfileKeepsItsDatabaseOnANamedVolumeOnLoopback5020()
    {
        // Only services without a profile start on a plain `docker compose up`: that must stay the SQLite one.
        var service = Assert.Single(Compose.Services, s => s.Profiles.Count == 0);
        Assert.Equal("communitylead", service.Name);
        Assert.Equal("deploy/Dockerfile", service.Dockerfile);
        Assert.Equal("/data", Assert.Single(service.NamedVolumes).Target);
        Assert.Equal(["127.0.0.1:5020:8080"], service.Ports);
    }

    [Fact]
    public void Compose_PostgresProfile_HasAPostgres15ServerCheckedByPgIsReady()
    {
        Assert.Equal("postgres:15", Db.Image);
        var check = Yaml.Map(Db.Node, "healthcheck")!;
        Assert.Contains(Yaml.List(check, "test"), part => Yaml.Text(part)!.Contains("pg_isready"));
        Assert.Equal("/var/lib/postgresql/data", Assert.Single(Db.NamedVolumes).Target);
        // The password comes from the environment, with a default only good for a trial on one's own machine.
        Assert.Matches(@"^\$\{COMMUNITYLEAD_DB_PASSWORD:-[^}]+\}$", Db.Environment["POSTGRES_PASSWORD"]);
    }

    [Fact]
    public void Compose_PostgresProfile_RunsTwoInstancesOnTheDatabaseOnceItIsHealthy()
    {
        Assert.Equal(2, Instances.Count);
        foreach (var instance in Instances)
        {
            Assert.Equal("Postgres", instance.Environment["Database__Provider"]);
            var connection = new DbConnectionStringBuilder { ConnectionString = instance.Environment["ConnectionStrings__CommunityLead"] };
            Assert.Equal(Db.Name, connection["Host"]);
            Assert.Equal(Db.Environment["POSTGRES_DB"], connection["Database"]);
            Assert.Equal(Db.Environment["POSTGRES_USER"], connection["Username"]);
            Assert.Equal(Db.Environment["POSTGRES_PASSWORD"], connection["Password"]);
            Assert.Equal("service_healthy", instance.DependsOn[Db.Name]);
            Assert.Empty(instance.Ports); // reached through the balancer only
        }
    }

    [Fact]
    public void Compose_Balancer_ConfigFileNamesBothInstancesOnPort8080AndTakesAFullLabBatch()
    {
        var (source, target) = Assert.Single(Balancer.Volumes);
        Assert.Equal("/etc/nginx/conf.d/default.conf", target);
        var config = File.ReadAllText(RepoFiles.PathOf(source));
        foreach (var instance in Instances)
            Assert.Matches($@"server\s+{Regex.Escape(instance.Name)}:8080\s*;", config);
        Assert.Equal(["127.0.0.1:5030:80"], Balancer.Ports);
        // nginx must let the largest accepted batch through, so an oversized one gets the service's own 413.
        var limit = Regex.Match(config, @"client_max_body_size\s+(\d+)m\s*;");
        Assert.True(limit.Success, "client_max_body_size in megabytes");
        Assert.True(long.Parse(limit.Groups[1].Value) * 1024 * 1024 > new LabIntakeOptions().MaxBatchBytes);
    }

    [Fact]
    public void Compose_PostgresProfile_InstancesPoolsFitTheServersConnectionLimit()
    {
        // PostgreSQL's max_connections: its default, unless db's command sets it.
        var command = Yaml.Child(Db.Node, "command") is YamlSequenceNode list
            ? string.Join(' ', list.Children.Select(Yaml.Text))
            : Yaml.Text(Yaml.Child(Db.Node, "command")) ?? "";
        var setting = Regex.Match(command, @"max_connections=(\d+)");
        var maxConnections = setting.Success ? int.Parse(setting.Groups[1].Value) : 100;
        const int SuperuserReserved = 3;  // superuser_reserved_connections' default
        const int ForCommands = 10;       // `run --rm` commands (migrate, keys) and pg_dump beside the instances

        // Npgsql's own default pool (100 per instance) would not fit: every instance names its size.
        var pools = Instances.Select(instance =>
        {
            var connection = new DbConnectionStringBuilder { ConnectionString = instance.Environment["ConnectionStrings__CommunityLead"] };
            Assert.True(connection.TryGetValue("Maximum Pool Size", out var size), $"{instance.Name}: no Maximum Pool Size");
            return int.Parse((string)size);
        }).ToList();
        Assert.True(pools.Sum() + SuperuserReserved + ForCommands <= maxConnections,
            $"pools of {string.Join(" + ", pools)} connections do not fit max_connections={maxConnections}");
    }

    [Fact]
    public void Compose_Balancer_PassesFailedAndUnhealthyAnswersToTheOtherInstanceButNeverRepeatsAPost()
    {
        var (source, _) = Assert.Single(Balancer.Volumes);
        var config = File.ReadAllText(RepoFiles.PathOf(source));
        var nextUpstream = Regex.Match(config, @"^\s*proxy_next_upstream\s+([^;]+);", RegexOptions.Multiline);
        Assert.True(nextUpstream.Success, "proxy_next_upstream");
        var cases = nextUpstream.Groups[1].Value.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        // 503: what GET /health answers when the instance cannot reach its database.
        Assert.Superset(new HashSet<string> { "error", "timeout", "http_502", "http_503" }, cases.ToHashSet());
        // A POST that reached one instance may have been stored: it must not be sent to the other as well.
        Assert.DoesNotContain("non_idempotent", cases);
    }

    [Fact]
    public void Compose_ServiceInstances_BelieveForwardedHeadersFromAPrivateNetworkOnly()
    {
        // Sign-in limits count the client's address: behind the balancer it must come from X-Forwarded-For,
        // believed from the Docker network only, never from everyone.
        var services = Compose.Services.Where(s => s.Dockerfile == "deploy/Dockerfile").ToList();
        Assert.Equal(3, services.Count);
        foreach (var service in services)
        {
            var network = System.Net.IPNetwork.Parse(service.Environment["ForwardedHeaders__KnownNetworks__0"]);
            // RFC 1918 §3: 172.16.0.0/12 is private address space.
            Assert.True(System.Net.IPNetwork.Parse("172.16.0.0/12").Contains(network.BaseAddress) && network.PrefixLength >= 12,
                $"{service.Name} trusts {network}");
        }
    }

    [Fact]
    public void Compose_Balancer_PassesOnTheSchemeOfATlsProxyInFront()
    {
        var (source, _) = Assert.Single(Balancer.Volumes);
        var config = File.ReadAllText(RepoFiles.PathOf(source));
        var proto = Regex.Match(config, @"proxy_set_header\s+X-Forwarded-Proto\s+\$(\w+)\s*;");
        Assert.True(proto.Success, "X-Forwarded-Proto");
        // The balancer's own $scheme is always http (it listens on port 80) and would hide a TLS proxy's https:
        // the header sent on is the incoming one, or $scheme when there is none.
        var map = Regex.Match(config, @"map\s+\$http_x_forwarded_proto\s+\$(\w+)\s*\{([^}]*)\}");
        Assert.True(map.Success, "map $http_x_forwarded_proto");
        Assert.Equal(proto.Groups[1].Value, map.Groups[1].Value);
        Assert.Matches(@"default\s+\$http_x_forwarded_proto\s*;", map.Groups[2].Value);
        Assert.Matches(@"""""\s+\$scheme\s*;", map.Groups[2].Value);
    }

    [Fact]
    public void Compose_NamedVolumes_AreAllDeclaredAtTheTopLevel()
    {
        var used = Compose.Services.SelectMany(s => s.NamedVolumes).Select(v => v.Source).ToList();
        Assert.NotEmpty(used);
        Assert.All(used, name => Assert.Contains(name, Compose.DeclaredVolumes));
    }

    [Fact]
    public void Compose_Ports_AreAllPublishedOnLoopbackOnly()
    {
        // The service speaks plain HTTP: TLS is a proxy's job (deploy/reverse-proxy.md), never a bare public port.
        var ports = Compose.Services.SelectMany(s => s.Ports).ToList();
        Assert.NotEmpty(ports);
        Assert.All(ports, port => Assert.StartsWith("127.0.0.1:", port));
    }
}
