using System.Text.Json;
using FluentValidation;

namespace Ledgerline.Api.Http;

/// <summary>Validation messages name fields as the JSON does (camelCase paths), not as the C# records do.</summary>
public static class ValidationNames
{
    public static void UseJsonNames()
    {
        ValidatorOptions.Global.PropertyNameResolver = (_, member, _) =>
            member is null ? null : JsonNamingPolicy.CamelCase.ConvertName(member.Name);
        ValidatorOptions.Global.DisplayNameResolver = (_, member, _) =>
            member is null ? null : JsonNamingPolicy.CamelCase.ConvertName(member.Name);
    }
}
