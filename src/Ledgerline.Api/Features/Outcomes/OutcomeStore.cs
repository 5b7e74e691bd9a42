using System.Data.Common;
using Ledgerline.Api.Data;
using Ledgerline.Api.Ledger;
using Ledgerline.Scoring.Outcomes;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Storage;

namespace Ledgerline.Api.Features.Outcomes;

/// <summary>
/// Writes observations and decisions' current outcomes inside the request's transaction without a
/// tracked entity per row: observations through the store's bulk insert, the current outcome
/// through prepared updates built from the EF model (<see cref="ModelStatement"/>).
/// </summary>
internal sealed class OutcomeStore : IAsyncDisposable
{
    private readonly LedgerlineDbContext _db;
    private readonly ModelStatement _update;
    private readonly DbCommand _updateCommand;
    private readonly ModelStatement _updateScores;
    private readonly DbCommand _updateScoresCommand;

    private OutcomeStore(LedgerlineDbContext db, DbConnection connection, DbTransaction transaction)
    {
        _db = db;
        _update = ModelStatement.Update<Decision>(db, nameof(Decision.Id), nameof(Decision.Outcome), nameof(Decision.Matured), nameof(Decision.OutcomeObservedAt));
        _updateCommand = _update.CreateCommand(connection, transaction);
        // The scores carry the outcome too, for the reports' index (see DecisionScore).
        _updateScores = ModelStatement.Update<DecisionScore>(db, nameof(DecisionScore.DecisionId), nameof(DecisionScore.Outcome), nameof(DecisionScore.Matured));
        _updateScoresCommand = _updateScores.CreateCommand(connection, transaction);
    }

    /// <summary>Prepares the commands on the context's open connection and current transaction.</summary>
    public static OutcomeStore Create(LedgerlineDbContext db) =>
        new(db, db.Database.GetDbConnection(),
            db.Database.CurrentTransaction?.GetDbTransaction() ?? throw new InvalidOperationException("Outcomes are written inside a transaction."));

    /// <summary>Inserts a chunk of observations.</summary>
    public Task InsertAllAsync(IReadOnlyList<OutcomeObservation> observations, CancellationToken ct) =>
        StoreDialect.Of(_db).BulkInsertAsync(_db, observations, ct);

    public async Task UpdateDecisionAsync(Guid decisionId, PerformanceClass outcome, bool matured, DateOnly observedAt, CancellationToken ct)
    {
        await _update.ExecuteAsync(_updateCommand, ct, outcome, matured, observedAt, decisionId);
        await _updateScores.ExecuteAsync(_updateScoresCommand, ct, outcome, matured, decisionId);
    }

    public async ValueTask DisposeAsync()
    {
        await _updateCommand.DisposeAsync();
        await _updateScoresCommand.DisposeAsync();
    }
}
