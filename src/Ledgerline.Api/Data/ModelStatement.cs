using System.Collections.Concurrent;
using System.Data.Common;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Metadata;
using Microsoft.EntityFrameworkCore.Storage;

namespace Ledgerline.Api.Data;

/// <summary>
/// One plain SQL statement built from the EF model, for the paths that cannot afford a tracked
/// entity per row (the decision log, outcome ingestion). Table and column names and every value
/// conversion (enum words, text GUIDs and dates on SQLite) come from the model, so the same
/// statement is right on every provider. Built once per provider and kept.
/// </summary>
public sealed class ModelStatement
{
    private static readonly ConcurrentDictionary<(string Provider, Type Entity, string Shape), ModelStatement> Cache = new();

    private readonly Column[] _columns;

    private ModelStatement(IEntityType entity, Column[] columns, string sql)
    {
        Entity = entity;
        _columns = columns;
        Sql = sql;
    }

    public IEntityType Entity { get; }

    public string Sql { get; }

    /// <summary>The columns the statement binds, in parameter order.</summary>
    public IReadOnlyList<Column> Columns => _columns;

    /// <summary>
    /// <c>INSERT</c> of every column but a database-generated integer key; with
    /// <paramref name="skipConflicts"/>, <c>ON CONFLICT DO NOTHING</c> (SQLite 3.24+, PostgreSQL 9.5+)
    /// so a unique-index collision leaves that row out instead of failing the transaction.
    /// </summary>
    public static ModelStatement Insert<TEntity>(LedgerlineDbContext db, bool skipConflicts = false) =>
        Cache.GetOrAdd((db.Database.ProviderName!, typeof(TEntity), skipConflicts ? "insert-skip" : "insert"), _ =>
        {
            var entity = db.Model.FindEntityType(typeof(TEntity))!;
            var columns = entity.GetProperties().Where(p => !(p.IsPrimaryKey() && p.ClrType == typeof(long))).Select(p => Column.Of(entity, p)).ToArray();
            var sql = db.GetService<ISqlGenerationHelper>();
            var text = $"INSERT INTO {Table(entity, sql)} ({string.Join(", ", columns.Select(c => sql.DelimitIdentifier(c.Name)))}) " +
                $"VALUES ({string.Join(", ", columns.Select((_, i) => sql.GenerateParameterName($"p{i}")))})" + (skipConflicts ? " ON CONFLICT DO NOTHING" : "");
            return new ModelStatement(entity, columns, text);
        });

    /// <summary><c>UPDATE … SET</c> the <paramref name="set"/> properties <c>WHERE</c> <paramref name="key"/> equals the last parameter.</summary>
    public static ModelStatement Update<TEntity>(LedgerlineDbContext db, string key, params string[] set) =>
        Cache.GetOrAdd((db.Database.ProviderName!, typeof(TEntity), "update:" + string.Join(',', set) + ":" + key), _ =>
        {
            var entity = db.Model.FindEntityType(typeof(TEntity))!;
            var columns = set.Append(key).Select(p => Column.Of(entity, entity.FindProperty(p)!)).ToArray();
            var sql = db.GetService<ISqlGenerationHelper>();
            var assignments = string.Join(", ", columns[..^1].Select((c, i) => $"{sql.DelimitIdentifier(c.Name)} = {sql.GenerateParameterName($"p{i}")}"));
            var text = $"UPDATE {Table(entity, sql)} SET {assignments} WHERE {sql.DelimitIdentifier(columns[^1].Name)} = {sql.GenerateParameterName($"p{columns.Length - 1}")}";
            return new ModelStatement(entity, columns, text);
        });

    public DbCommand CreateCommand(DbConnection connection, DbTransaction? transaction)
    {
        var command = connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = Sql;
        return command;
    }

    /// <summary>Binds one entity's values (insert statements) and runs the command; the number of rows it changed.</summary>
    public int Execute(DbCommand command, object entity)
    {
        for (var i = 0; i < _columns.Length; i++)
        {
            Set(command, i, _columns[i].Get(entity));
        }

        return command.ExecuteNonQuery();
    }

    /// <summary>Binds values in column order and runs the command; the number of rows it changed.</summary>
    public Task<int> ExecuteAsync(DbCommand command, CancellationToken ct, params object?[] values)
    {
        for (var i = 0; i < values.Length; i++)
        {
            Set(command, i, values[i]);
        }

        return command.ExecuteNonQueryAsync(ct);
    }

    /// <summary>One entity's statement as a batch command; <paramref name="parameters"/> only manufactures parameters.</summary>
    public DbBatchCommand CreateBatchCommand(DbBatch batch, DbCommand parameters, object entity)
    {
        var command = batch.CreateBatchCommand();
        command.CommandText = Sql;
        for (var i = 0; i < _columns.Length; i++)
        {
            var column = _columns[i];
            command.Parameters.Add(column.Mapping.CreateParameter(parameters, $"p{i}", column.Get(entity), column.Property.IsNullable));
        }

        return command;
    }

    /// <summary>
    /// The first execution makes the parameters through the model's type mappings, which also
    /// configure them; later ones only replace their values, converted the same way.
    /// </summary>
    private void Set(DbCommand command, int index, object? value)
    {
        var column = _columns[index];
        if (command.Parameters.Count == index)
        {
            command.Parameters.Add(column.Mapping.CreateParameter(command, $"p{index}", value, nullable: true));
            return;
        }

        command.Parameters[index].Value = column.ToProvider(value) ?? DBNull.Value;
    }

    private static string Table(IEntityType entity, ISqlGenerationHelper sql) => sql.DelimitIdentifier(entity.GetTableName()!, entity.GetSchema());

    /// <summary>A mapped column: its name, type mapping and how to read it from an entity.</summary>
    public sealed record Column(IProperty Property, string Name, RelationalTypeMapping Mapping, IClrPropertyGetter Getter)
    {
        public static Column Of(IEntityType entity, IProperty property) =>
            new(property, property.GetColumnName(StoreObjectIdentifier.Table(entity.GetTableName()!, entity.GetSchema()))!,
                (RelationalTypeMapping)property.GetRelationalTypeMapping(), property.GetGetter());

        public object? Get(object entity) => Getter.GetClrValueUsingContainingEntity(entity);

        /// <summary>The value as the provider stores it (after the model's conversion).</summary>
        public object? ToProvider(object? value) => Mapping.Converter is { } converter ? converter.ConvertToProvider(value) : value;
    }
}
