using System.Data.Common;
using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Decisions;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Metadata;
using Microsoft.EntityFrameworkCore.Storage;
using Npgsql;
using NpgsqlTypes;

namespace Ledgerline.Api.Features.Outcomes;

/// <summary>
/// Writes observations and decisions' current outcomes through two prepared commands inside the
/// request's transaction: the bulk path cannot afford a tracked entity per row. Table names,
/// column names and value conversions come from the EF model, so the SQL stays the model's on
/// every provider. On PostgreSQL observations go in by binary COPY instead: one stream per chunk
/// rather than one round trip per row.
/// </summary>
internal sealed class OutcomeStore : IAsyncDisposable
{
    private readonly DbCommand _insert;
    private readonly RelationalTypeMapping[] _insertTypes;
    private readonly DbCommand _update;
    private readonly RelationalTypeMapping[] _updateTypes;
    private readonly DbCommand _updateScores;
    private readonly RelationalTypeMapping[] _updateScoresTypes;
    private string? _copy;

    private OutcomeStore(
        (DbCommand Command, RelationalTypeMapping[] Types) insert,
        (DbCommand Command, RelationalTypeMapping[] Types) update,
        (DbCommand Command, RelationalTypeMapping[] Types) updateScores)
    {
        (_insert, _insertTypes) = insert;
        (_update, _updateTypes) = update;
        (_updateScores, _updateScoresTypes) = updateScores;
    }

    /// <summary>Prepares the commands on the context's open connection and current transaction.</summary>
    public static OutcomeStore Create(LedgerlineDbContext db)
    {
        var sql = db.GetService<ISqlGenerationHelper>();
        var connection = db.Database.GetDbConnection();
        var transaction = db.Database.CurrentTransaction?.GetDbTransaction()
            ?? throw new InvalidOperationException("Outcomes are written inside a transaction.");

        var outcome = db.Model.FindEntityType(typeof(OutcomeObservation))!;
        string[] insertColumns =
        [
            nameof(OutcomeObservation.DecisionId), nameof(OutcomeObservation.ObservedAt), nameof(OutcomeObservation.WorstDaysPastDue),
            nameof(OutcomeObservation.ChargedOff), nameof(OutcomeObservation.Status), nameof(OutcomeObservation.Classified),
            nameof(OutcomeObservation.ReceivedAt),
        ];
        var (insert, insertTypes) = Prepare(connection, transaction, outcome, insertColumns, columns =>
            $"INSERT INTO {sql.DelimitIdentifier(outcome.GetTableName()!)} ({string.Join(", ", columns.Select(sql.DelimitIdentifier))}) " +
            $"VALUES ({string.Join(", ", columns.Select((_, i) => sql.GenerateParameterName($"p{i}")))})");

        var decision = db.Model.FindEntityType(typeof(Decision))!;
        string[] updateColumns = [nameof(Decision.Outcome), nameof(Decision.Matured), nameof(Decision.OutcomeObservedAt), nameof(Decision.Id)];
        var update = Prepare(connection, transaction, decision, updateColumns, columns => UpdateSql(sql, decision, columns));

        // The scores carry the outcome too, for the reports' index (see DecisionScore).
        var score = db.Model.FindEntityType(typeof(DecisionScore))!;
        string[] scoreColumns = [nameof(DecisionScore.Outcome), nameof(DecisionScore.Matured), nameof(DecisionScore.DecisionId)];
        var updateScores = Prepare(connection, transaction, score, scoreColumns, columns => UpdateSql(sql, score, columns));

        var store = new OutcomeStore((insert, insertTypes), update, updateScores);
        if (connection is NpgsqlConnection)
        {
            // The same columns in the same order as the prepared insert, which WriteCopyRowAsync follows.
            var table = StoreObjectIdentifier.Table(outcome.GetTableName()!, outcome.GetSchema());
            var columns = insertColumns.Select(c => sql.DelimitIdentifier(outcome.FindProperty(c)!.GetColumnName(table)!));
            store._copy = $"COPY {sql.DelimitIdentifier(outcome.GetTableName()!)} ({string.Join(", ", columns)}) FROM STDIN (FORMAT BINARY)";
        }

        return store;
    }

    /// <summary>Inserts a chunk of observations, by binary COPY on PostgreSQL.</summary>
    public async Task InsertAllAsync(IReadOnlyList<OutcomeObservation> observations, CancellationToken ct)
    {
        if (_copy is null || observations.Count < 2)
        {
            foreach (var o in observations)
            {
                await InsertAsync(o, ct);
            }

            return;
        }

        await using var writer = await ((NpgsqlConnection)_insert.Connection!).BeginBinaryImportAsync(_copy, ct);
        foreach (var o in observations)
        {
            await writer.StartRowAsync(ct);
            await writer.WriteAsync(o.DecisionId, NpgsqlDbType.Uuid, ct);
            await writer.WriteAsync(o.ObservedAt, NpgsqlDbType.Date, ct);
            await WriteNullableAsync(writer, o.WorstDaysPastDue, NpgsqlDbType.Integer, ct);
            await WriteNullableAsync(writer, o.ChargedOff, NpgsqlDbType.Boolean, ct);
            await WriteNullableAsync(writer, o.Status, NpgsqlDbType.Varchar, ct);
            // Enums are stored by name (LedgerlineDbContext's convention).
            await WriteNullableAsync(writer, o.Classified?.ToString(), NpgsqlDbType.Varchar, ct);
            await writer.WriteAsync(o.ReceivedAt.UtcDateTime, NpgsqlDbType.TimestampTz, ct);
        }

        await writer.CompleteAsync(ct);
    }

    public Task InsertAsync(OutcomeObservation o, CancellationToken ct) =>
        ExecuteAsync(_insert, _insertTypes, ct, o.DecisionId, o.ObservedAt, o.WorstDaysPastDue, o.ChargedOff, o.Status, o.Classified, o.ReceivedAt);

    public async Task UpdateDecisionAsync(Guid decisionId, OutcomeClass outcome, bool matured, DateOnly observedAt, CancellationToken ct)
    {
        await ExecuteAsync(_update, _updateTypes, ct, outcome, matured, observedAt, decisionId);
        await ExecuteAsync(_updateScores, _updateScoresTypes, ct, outcome, matured, decisionId);
    }

    public async ValueTask DisposeAsync()
    {
        await _insert.DisposeAsync();
        await _update.DisposeAsync();
        await _updateScores.DisposeAsync();
    }

    /// <summary>UPDATE table SET every column but the last WHERE the last.</summary>
    private static string UpdateSql(ISqlGenerationHelper sql, IEntityType entity, string[] columns) =>
        $"UPDATE {sql.DelimitIdentifier(entity.GetTableName()!)} SET " +
        string.Join(", ", columns[..^1].Select((c, i) => $"{sql.DelimitIdentifier(c)} = {sql.GenerateParameterName($"p{i}")}")) +
        $" WHERE {sql.DelimitIdentifier(columns[^1])} = {sql.GenerateParameterName($"p{columns.Length - 1}")}";

    private static Task WriteNullableAsync(NpgsqlBinaryImporter writer, object? value, NpgsqlDbType type, CancellationToken ct) =>
        value is null ? writer.WriteNullAsync(ct) : writer.WriteAsync(value, type, ct);

    private static (DbCommand Command, RelationalTypeMapping[] Types) Prepare(
        DbConnection connection, DbTransaction transaction, IEntityType entity, string[] properties, Func<string[], string> text)
    {
        var table = StoreObjectIdentifier.Table(entity.GetTableName()!, entity.GetSchema());
        var mapped = properties.Select(p => entity.FindProperty(p)!).ToArray();
        var command = connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = text(mapped.Select(p => p.GetColumnName(table)!).ToArray());
        return (command, mapped.Select(p => (RelationalTypeMapping)p.GetRelationalTypeMapping()).ToArray());
    }

    private static async Task ExecuteAsync(DbCommand command, RelationalTypeMapping[] types, CancellationToken ct, params object?[] values)
    {
        // The type mappings apply the model's conversions (enum names, GUID and date text on SQLite).
        for (var i = 0; i < values.Length; i++)
        {
            ReusedParameters.Set(command, i, types[i], $"p{i}", values[i], nullable: true);
        }

        await command.ExecuteNonQueryAsync(ct);
    }
}
