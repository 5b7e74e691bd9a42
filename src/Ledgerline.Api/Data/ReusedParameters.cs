using System.Data.Common;
using Microsoft.EntityFrameworkCore.Storage;

namespace Ledgerline.Api.Data;

/// <summary>
/// Parameters of a command executed once per row. The first row makes them through the model's
/// type mappings, which also configure them (text GUIDs and dates on SQLite); later rows only
/// replace their values, converted the same way, instead of building every parameter again.
/// </summary>
internal static class ReusedParameters
{
    public static void Set(DbCommand command, int index, RelationalTypeMapping mapping, string name, object? value, bool nullable)
    {
        if (command.Parameters.Count == index)
        {
            command.Parameters.Add(mapping.CreateParameter(command, name, value, nullable));
            return;
        }

        command.Parameters[index].Value = (mapping.Converter is { } converter ? converter.ConvertToProvider(value) : value) ?? DBNull.Value;
    }
}
