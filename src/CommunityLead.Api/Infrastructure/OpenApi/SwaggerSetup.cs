using Microsoft.Extensions.Options;
using Microsoft.OpenApi;
using Swashbuckle.AspNetCore.SwaggerGen;

namespace CommunityLead.Api.Infrastructure.OpenApi;

/// <summary>Settings of the "Swagger" section.</summary>
public sealed class SwaggerOptions
{
    public const string Section = "Swagger";

    /// <summary>Serve /swagger (the API description and its UI); unset, only in the Development environment.</summary>
    public bool? Enabled { get; set; }
}

public static class SwaggerSetup
{
    /// <summary>
    /// The UI is for people trying the API on their own machine; a deployment need not advertise every route,
    /// so it is off there unless a setting turns it on.
    /// </summary>
    public static void UseCommunityLeadSwagger(this WebApplication app)
    {
        if (!(app.Services.GetRequiredService<IOptions<SwaggerOptions>>().Value.Enabled ?? app.Environment.IsDevelopment())) return;
        app.UseSwagger();
        app.UseSwaggerUI();
    }

    /// <summary>What each tag covers, for a lab's developer reading the document cold.</summary>
    private static readonly (string Name, string Description)[] Tags =
    [
        ("Areas", "The areas the coordinator keeps, which households belong to and reports group by"),
        ("Households", "Homes signed up to the program, with consent, language and what matters for the advice"),
        ("Kits", "Each kit from issue to closing: collection, receipt at the lab, replacement"),
        ("Lab results", "Batches of results and QC from the partner lab, their verdict and release"),
        ("Interpretation", "What a kit's results mean against the program's action levels"),
        ("Letters", "The household's letter: preview, download, mailing batches and marking sent"),
        ("Attention", "Kits a person must act on, most urgent first"),
        ("Reports", "Aggregate counts for the health department; never a row about one home"),
        ("Admin", "Keys and the audit trail"),
        ("Wording", "Every sentence the service can show a household, for review"),
        ("Household results", "A household's own result and letter, by kit code and the secret on its letter (no key)"),
        ("Health", "Whether this instance can take work (no key needed)"),
    ];

    public static void AddCommunityLeadSwagger(this IServiceCollection services) =>
        services.AddSwaggerGen(o =>
        {
            o.SwaggerDoc("v1", new OpenApiInfo
            {
                Title = "CommunityLead API",
                Version = "v1",
                Description = "Households, kits, samples and results of a community lead-testing program. " +
                              "Send 'Authorization: Bearer <key>'; keys come from the service's 'keys create' command. " +
                              "Errors are RFC 9457 problem details naming the field or row.",
                Contact = new OpenApiContact { Name = "The program's CommunityLead administrator" },
                License = new OpenApiLicense { Name = "Proprietary: see the program's agreement" },
            });
            // Relative: the document is served by the instance it describes, behind whatever proxy.
            o.AddServer(new OpenApiServer { Url = "/", Description = "This instance" });
            o.AddSecurityDefinition("bearer", new OpenApiSecurityScheme
            {
                Type = SecuritySchemeType.Http,
                Scheme = "bearer",
                Description = "An API key made with 'keys create --role <role> --label <label>'.",
            });
            o.DocumentFilter<TagDescriptions>();
            o.OperationFilter<OperationDetails>();
            o.SchemaFilter<RequiredMembers>();
            o.SupportNonNullableReferenceTypes();
            o.CustomSchemaIds(SchemaId);
        });

    /// <summary>
    /// A type's own name ("BatchStatus", not its namespace): nested types keep their outer type's name, generic
    /// ones name their arguments ("PageOfKit"). Two types of one name would fail the document at start-up, in a test.
    /// </summary>
    internal static string SchemaId(Type type)
    {
        var name = type.IsGenericType
            ? type.Name[..type.Name.IndexOf('`')] + "Of" + string.Concat(type.GetGenericArguments().Select(SchemaId))
            : type.Name;
        return type.DeclaringType is { } outer ? SchemaId(outer) + name : name;
    }

    private sealed class TagDescriptions : IDocumentFilter
    {
        public void Apply(OpenApiDocument document, DocumentFilterContext context) =>
            document.Tags = new HashSet<OpenApiTag>(Tags.Select(t => new OpenApiTag { Name = t.Name, Description = t.Description }));
    }
}
