using Microsoft.AspNetCore.Authorization;
using Microsoft.AspNetCore.Http.Metadata;
using Microsoft.OpenApi;
using Swashbuckle.AspNetCore.SwaggerGen;

namespace CommunityLead.Api.Infrastructure.OpenApi;

/// <summary>
/// What the endpoint metadata knows but Swashbuckle does not write: which operations need a key (an open one such
/// as /health must not inherit the bearer requirement, nor list 401/403), the headers an operation reads or
/// answers with, and a binary schema for file answers (a PDF, a ZIP, a CSV) that have no .NET type.
/// </summary>
internal sealed class OperationDetails : IOperationFilter
{
    public void Apply(OpenApiOperation operation, OperationFilterContext context)
    {
        var metadata = context.ApiDescription.ActionDescriptor.EndpointMetadata;
        var open = metadata.OfType<IAllowAnonymous>().Any() || !metadata.OfType<IAuthorizeData>().Any();
        if (open)
        {
            operation.Responses?.Remove("401");
            operation.Responses?.Remove("403");
            // An empty requirement: no key needed (an operation without any would leave linters guessing).
            operation.Security = [new OpenApiSecurityRequirement()];
        }
        else
        {
            operation.Security = [new OpenApiSecurityRequirement { [new OpenApiSecuritySchemeReference("bearer", context.Document)] = [] }];
        }

        foreach (var header in metadata.OfType<DocumentedHeader>())
        {
            var schema = new OpenApiSchema { Type = JsonSchemaType.String };
            if (header.ResponseStatus is { } status
                && operation.Responses?.TryGetValue(status.ToString(), out var response) == true && response is OpenApiResponse written)
            {
                written.Headers ??= new Dictionary<string, IOpenApiHeader>();
                written.Headers[header.Name] = new OpenApiHeader { Description = header.Description, Schema = schema };
            }
            else if (header.ResponseStatus is null)
            {
                operation.Parameters ??= [];
                operation.Parameters.Add(new OpenApiParameter
                    { Name = header.Name, In = ParameterLocation.Header, Description = header.Description, Schema = schema });
            }
        }

        foreach (var query in metadata.OfType<DocumentedQuery>())
        {
            operation.Parameters ??= [];
            var existing = operation.Parameters.FirstOrDefault(p => p.Name == query.Name && p.In == ParameterLocation.Query);
            if (existing is not null) operation.Parameters.Remove(existing);
            operation.Parameters.Add(new OpenApiParameter
            {
                Name = query.Name, In = ParameterLocation.Query, Description = query.Description,
                Schema = context.SchemaGenerator.GenerateSchema(query.Type, context.SchemaRepository),
            });
        }

        // A CSV body is text with a header row, not the JSON body's schema.
        if (operation.RequestBody is OpenApiRequestBody { Content: { } content } && content.ContainsKey("text/csv"))
            content["text/csv"] = new OpenApiMediaType { Schema = new OpenApiSchema
            {
                Type = JsonSchemaType.String,
                Description = "UTF-8 text: a header row, then one result row per line (README, Lab results in CSV).",
            } };

        foreach (var produced in metadata.OfType<IProducesResponseTypeMetadata>().Where(p => p.Type is null || p.Type == typeof(void)))
        {
            if (operation.Responses?.TryGetValue(produced.StatusCode.ToString(), out var response) != true
                || response is not OpenApiResponse written) continue;
            written.Content ??= new Dictionary<string, IOpenApiMediaType>();
            foreach (var type in produced.ContentTypes)
                written.Content.TryAdd(type, new OpenApiMediaType { Schema = new OpenApiSchema
                    { Type = JsonSchemaType.String, Format = type.StartsWith("text/", StringComparison.Ordinal) ? null : "binary" } });
        }
    }
}
