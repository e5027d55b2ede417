namespace CommunityLead.Api.Auth;

public static class Roles
{
    /// <summary>Runs the program: signs households up, logs kits, sees personal data.</summary>
    public const string Coordinator = "coordinator";
    /// <summary>The partner lab: kit codes, bottles and collection times only.</summary>
    public const string Lab = "lab";
    /// <summary>The health department: aggregate reports only, never a row about one home.</summary>
    public const string Health = "health";
    /// <summary>Looks after the service: keys and the audit trail, no personal data.</summary>
    public const string Admin = "admin";

    public static readonly string[] All = [Coordinator, Lab, Health, Admin];
}

/// <summary>Policy names; each route group declares one.</summary>
public static class Policies
{
    public const string Coordinator = "coordinator";
    public const string KitReader = "kit-reader";
    public const string KitReceiver = "kit-receiver";
    public const string Lab = "lab";
    public const string LabReader = "lab-reader";
    public const string Health = "health";
    public const string Admin = "admin";
    public const string AreaReader = "area-reader";
    public const string AreaKeeper = "area-keeper";

    public static void Add(Microsoft.AspNetCore.Authorization.AuthorizationOptions options)
    {
        options.AddPolicy(Coordinator, p => p.RequireRole(Roles.Coordinator));
        options.AddPolicy(KitReader, p => p.RequireRole(Roles.Coordinator, Roles.Lab));
        options.AddPolicy(KitReceiver, p => p.RequireRole(Roles.Coordinator, Roles.Lab));
        options.AddPolicy(Lab, p => p.RequireRole(Roles.Lab));
        options.AddPolicy(LabReader, p => p.RequireRole(Roles.Lab, Roles.Coordinator));
        options.AddPolicy(Health, p => p.RequireRole(Roles.Health));
        options.AddPolicy(Admin, p => p.RequireRole(Roles.Admin));
        options.AddPolicy(AreaReader, p => p.RequireRole(Roles.Coordinator, Roles.Admin, Roles.Health));
        options.AddPolicy(AreaKeeper, p => p.RequireRole(Roles.Coordinator, Roles.Admin));
        // Nothing is open without a key unless it says so (/health). That every route names its own policy
        // is checked by the role-matrix test, which fails on any route it has no expectation for.
        options.FallbackPolicy = new Microsoft.AspNetCore.Authorization.AuthorizationPolicyBuilder()
            .RequireAuthenticatedUser().Build();
    }
}
