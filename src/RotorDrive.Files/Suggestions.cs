namespace RotorDrive.Files;

/// <summary>Finds the known name closest to a mistyped one, for "did you mean" hints.</summary>
internal static class Suggestions
{
    /// <summary>The closest candidate within an edit distance of a third of the name's length (at least 1), or null.</summary>
    public static string? Closest(string name, IEnumerable<string> candidates)
    {
        string lowered = name.ToLowerInvariant();
        int limit = Math.Max(1, lowered.Length / 3);
        string? best = null;
        int bestDistance = int.MaxValue;
        foreach (var candidate in candidates)
        {
            int d = Distance(lowered, candidate.ToLowerInvariant());
            if (d < bestDistance)
            {
                bestDistance = d;
                best = candidate;
            }
        }
        return bestDistance <= limit ? best : null;
    }

    // Levenshtein distance with two rolling rows (V. I. Levenshtein, Soviet Physics Doklady 10(8), 1966).
    private static int Distance(string a, string b)
    {
        if (a.Length > 200 || b.Length > 200)
        {
            return int.MaxValue;
        }
        var previous = new int[b.Length + 1];
        var current = new int[b.Length + 1];
        for (int j = 0; j <= b.Length; j++)
        {
            previous[j] = j;
        }
        for (int i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (int j = 1; j <= b.Length; j++)
            {
                int cost = a[i - 1] == b[j - 1] ? 0 : 1;
                current[j] = Math.Min(Math.Min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + cost);
            }
            (previous, current) = (current, previous);
        }
        return previous[b.Length];
    }
}
