namespace Ledgerline.Scoring.Engine;

/// <summary>What kind of value an application gave for a characteristic.</summary>
public enum ScoringValueKind
{
    /// <summary>Absent or null.</summary>
    Missing,

    /// <summary>A number.</summary>
    Number,

    /// <summary>A text.</summary>
    Text,
}

/// <summary>One already-parsed input value. A struct, so scoring input costs no allocation.</summary>
public readonly struct ScoringValue
{
    private ScoringValue(ScoringValueKind kind, decimal number, string? text)
    {
        Kind = kind;
        Number = number;
        Text = text;
    }

    /// <summary>An absent or null value.</summary>
    public static ScoringValue Missing => default;

    /// <summary>What kind of value this is.</summary>
    public ScoringValueKind Kind { get; }

    /// <summary>The number, when <see cref="Kind"/> is <see cref="ScoringValueKind.Number"/>.</summary>
    public decimal Number { get; }

    /// <summary>The text, when <see cref="Kind"/> is <see cref="ScoringValueKind.Text"/>.</summary>
    public string? Text { get; }

    /// <summary>A numeric value.</summary>
    public static ScoringValue Of(decimal number) => new(ScoringValueKind.Number, number, null);

    /// <summary>A text value.</summary>
    public static ScoringValue Of(string text) => new(ScoringValueKind.Text, 0, text);

    /// <inheritdoc />
    public override string ToString() => Kind switch
    {
        ScoringValueKind.Number => Number.ToString(System.Globalization.CultureInfo.InvariantCulture),
        ScoringValueKind.Text => $"'{Text}'",
        _ => "missing",
    };
}
