using System.Reflection;
using System.Text.Json;
using FluentValidation;
using FluentValidation.Validators;
using Microsoft.OpenApi;
using Swashbuckle.AspNetCore.SwaggerGen;

namespace CommunityLead.Api.Infrastructure.OpenApi;

/// <summary>
/// Marks the members a client must send or can count on. A request is what its validator demands (a request's
/// members are nullable on purpose, so a missing one is named in a 400 instead of failing to bind); an answer's
/// members are those that are never null, since the JSON writes every member.
/// </summary>
internal sealed class RequiredMembers(IServiceProvider services) : ISchemaFilter
{
    private static readonly NullabilityInfoContext Nullability = new();

    public void Apply(IOpenApiSchema schema, SchemaFilterContext context)
    {
        if (schema is not OpenApiSchema written || written.Properties is not { Count: > 0 } properties) return;
        var type = context.Type;
        var required = type.Name.EndsWith("Request", StringComparison.Ordinal)
            ? DemandedByValidator(type)
            : type.GetProperties(BindingFlags.Public | BindingFlags.Instance).Where(NeverNull).Select(p => p.Name);
        written.Required ??= new HashSet<string>();
        foreach (var name in required.Select(JsonNamingPolicy.CamelCase.ConvertName).Where(properties.ContainsKey))
            written.Required.Add(name);
    }

    private IEnumerable<string> DemandedByValidator(Type type)
    {
        using var scope = services.CreateScope();
        if (scope.ServiceProvider.GetService(typeof(IValidator<>).MakeGenericType(type)) is not IValidator validator) return [];
        var descriptor = validator.CreateDescriptor();
        return descriptor.GetMembersWithValidators()
            .Where(member => member.Any(rule => rule.Validator is INotNullValidator or INotEmptyValidator))
            .Select(member => member.Key).ToList();
    }

    private static bool NeverNull(PropertyInfo property) =>
        property.PropertyType.IsValueType
            ? Nullable.GetUnderlyingType(property.PropertyType) is null
            : Nullability.Create(property).ReadState == NullabilityState.NotNull;
}
