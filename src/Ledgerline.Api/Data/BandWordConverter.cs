using Ledgerline.Scoring.Scorecards;
using Microsoft.EntityFrameworkCore.Storage.ValueConversion;

namespace Ledgerline.Api.Data;

/// <summary>
/// Decision bands are stored as their wire words ("approve", "refer", "decline"), as they have been
/// since the first migration, rather than as the enum names other enums are stored by.
/// </summary>
internal sealed class BandWordConverter() : ValueConverter<Band, string>(band => BandNames.ToWire(band), word => Parse(word))
{
    private static Band Parse(string word) =>
        BandNames.TryParse(word, out var band) ? band : throw new InvalidOperationException($"A stored band reads '{word}', which is not a band.");
}
