using YamlDotNet.RepresentationModel;

namespace CommunityLead.Tests.Deploy;

/// <summary>One service of the compose file, read in both of Compose's spellings where it has two.</summary>
internal sealed record ComposeService(string Name, YamlMappingNode Node)
{
    public IReadOnlyList<string> Profiles => [.. Yaml.List(Node, "profiles").Select(p => Yaml.Text(p)!)];

    public string? Image => Yaml.Text(Yaml.Child(Node, "image"));

    public string? Dockerfile => Yaml.Map(Node, "build") is { } build ? Yaml.Text(Yaml.Child(build, "dockerfile")) : null;

    /// <summary>`KEY: value` mapping or `- KEY=value` list.</summary>
    public IReadOnlyDictionary<string, string> Environment => Yaml.Child(Node, "environment") switch
    {
        YamlMappingNode map => map.Children.ToDictionary(e => Yaml.Text(e.Key)!, e => Yaml.Text(e.Value) ?? ""),
        YamlSequenceNode list => list.Children.Select(e => Yaml.Text(e)!.Split('=', 2))
            .ToDictionary(kv => kv[0], kv => kv.Length > 1 ? kv[1] : ""),
        _ => new Dictionary<string, string>(),
    };

    /// <summary>Short syntax as written; long syntax rendered as `host_ip:published:target`.</summary>
    public IReadOnlyList<string> Ports => [.. Yaml.List(Node, "ports").Select(p => p is YamlMappingNode m
        ? $"{Yaml.Text(Yaml.Child(m, "host_ip"))}:{Yaml.Text(Yaml.Child(m, "published"))}:{Yaml.Text(Yaml.Child(m, "target"))}"
        : Yaml.Text(p)!)];

    /// <summary>Source ("" for an anonymous volume) and target of each mount.</summary>
    public IReadOnlyList<(string Source, string Target)> Volumes => [.. Yaml.List(Node, "volumes").Select(v =>
    {
        if (v is YamlMappingNode m) return (Yaml.Text(Yaml.Child(m, "source")) ?? "", Yaml.Text(Yaml.Child(m, "target"))!);
        var parts = Yaml.Text(v)!.Split(':');
        return parts.Length == 1 ? ("", parts[0]) : (parts[0], parts[1]);
    })];

    /// <summary>Named volumes only: a bind mount's source is a path (./, /, ~).</summary>
    public IEnumerable<(string Source, string Target)> NamedVolumes =>
        Volumes.Where(v => v.Source.Length > 0 && v.Source[0] is not ('.' or '/' or '~'));

    /// <summary>Service name → condition; the list spelling means service_started.</summary>
    public IReadOnlyDictionary<string, string> DependsOn => Yaml.Child(Node, "depends_on") switch
    {
        YamlMappingNode map => map.Children.ToDictionary(d => Yaml.Text(d.Key)!,
            d => Yaml.Text(Yaml.Child((YamlMappingNode)d.Value, "condition")) ?? "service_started"),
        YamlSequenceNode list => list.Children.ToDictionary(d => Yaml.Text(d)!, _ => "service_started"),
        _ => new Dictionary<string, string>(),
    };
}
