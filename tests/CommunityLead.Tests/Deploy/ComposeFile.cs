using YamlDotNet.RepresentationModel;

namespace CommunityLead.Tests.Deploy;

/// <summary>
/// docker-compose.yml as a YAML tree (anchors and aliases resolved by the parser, as Compose does). No typed
/// model: the tests read the few keys they check, so a key Compose accepts but we don't model can't break them.
/// </summary>
internal sealed class ComposeFile(YamlMappingNode root)
{
    public static ComposeFile Load(string path)
    {
        using var reader = File.OpenText(path);
        var stream = new YamlStream();
        stream.Load(reader);
        return new ComposeFile((YamlMappingNode)stream.Documents.Single().RootNode);
    }

    public IReadOnlyList<ComposeService> Services =>
        [.. Yaml.Map(root, "services")!.Children.Select(s => new ComposeService(Yaml.Text(s.Key)!, (YamlMappingNode)s.Value))];

    public ComposeService Service(string name) => Services.Single(s => s.Name == name);

    public IReadOnlyList<string> DeclaredVolumes =>
        Yaml.Map(root, "volumes") is { } volumes ? [.. volumes.Children.Keys.Select(k => Yaml.Text(k)!)] : [];
}

/// <summary>Small readers for YamlDotNet's node tree.</summary>
internal static class Yaml
{
    public static YamlNode? Child(YamlMappingNode node, string key) =>
        node.Children.TryGetValue(new YamlScalarNode(key), out var value) ? value : null;

    public static YamlMappingNode? Map(YamlMappingNode node, string key) => Child(node, key) as YamlMappingNode;

    public static string? Text(YamlNode? node) => (node as YamlScalarNode)?.Value;

    public static IReadOnlyList<YamlNode> List(YamlMappingNode node, string key) =>
        Child(node, key) is YamlSequenceNode list ? [.. list.Children] : [];
}
