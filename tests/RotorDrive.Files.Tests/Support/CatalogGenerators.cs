using FsCheck;
using FsCheck.Fluent;
using RotorDrive.Files.Catalogs;

namespace RotorDrive.Files.Tests.Support;

/// <summary>FsCheck generators of valid catalog rows (every rule of the format holds) and of damaged catalog text.</summary>
internal static class CatalogGenerators
{
    // Mantissas use the full double precision so the writer's round-trip formatting is really exercised.
    private static Gen<double> Unit => Gen.Choose(1, int.MaxValue).Select(m => m / (double)int.MaxValue);

    /// <summary>A value in (0, 100]: within every column's physical upper bound (the smallest is 100).</summary>
    public static Gen<double> Positive => Gen.Zip(Unit, Gen.Choose(-4, 2), (u, e) => u * Math.Pow(10, e));

    public static Gen<double> NonNegative => Gen.Frequency((1, Gen.Constant(0.0)), (9, Positive));

    public static Gen<double> Between(double min, double max) => Gen.Frequency(
        (1, Gen.Constant(min)), (1, Gen.Constant(max)), (8, Unit.Select(u => min + (max - min) * u)));

    public static Gen<double?> Optional(Gen<double> gen) => Gen.Frequency((1, Gen.Constant<double?>(null)), (3, gen.Select(v => (double?)v)));

    private static readonly char[] IdChars = "abcdefXYZ0123456789-_. ,;\"'é/()".ToCharArray();

    /// <summary>Text with no leading or trailing whitespace, possibly holding separators and quotes.</summary>
    public static Gen<string> Text => Gen.ArrayOf(Gen.Elements(IdChars))
        .Select(cs => new string(cs).Trim())
        .Select(s => s.Length == 0 ? "x" : s);

    /// <summary>Rows made unique by suffixing their index to the id.</summary>
    public static Gen<List<T>> Rows<T>(Gen<T> row, Func<T, int, T> withIndex)
        => Gen.ListOf(row).Select(rows => rows.Select((r, i) => withIndex(r, i)).ToList());

    public static Gen<List<MotorRow>> Motors =>
        Rows(
            from id in Text
            from kv in Positive
            from r in Positive
            from i0 in NonNegative
            from v0 in Positive
            from imax in Positive
            from pmax in Positive
            from halfPoles in Gen.Choose(1, 30)
            from mass in Positive
            from rth in Optional(Positive)
            from tau in Optional(Positive)
            from tmax in Optional(Between(40, 250))
            select new MotorRow(id, kv, r, i0, v0, imax, pmax, 2 * halfPoles, mass, rth, tau, tmax),
            (m, i) => m with { Id = m.Id + "#" + i });

    public static Gen<List<ControllerRow>> Controllers =>
        Rows(
            from id in Text
            from cont in Positive
            from extra in NonNegative
            from duration in NonNegative
            from minCells in Gen.Choose(1, 14)
            from more in Gen.Choose(0, 10)
            from ron in NonNegative
            from idle in NonNegative
            from erpm in Positive
            from mass in Positive
            from reversible in Gen.Elements(true, false)
            select new ControllerRow(id, cont, cont + extra, duration, minCells, minCells + more, ron, idle, erpm, mass, reversible),
            (c, i) => c with { Id = c.Id + "#" + i });

    public static Gen<List<PackRow>> Packs =>
        Rows(
            from id in Text
            from chemistry in Text
            from s in Gen.Choose(1, 24)
            from p in Gen.Choose(1, 12)
            from mah in Positive
            from cont in Positive
            from extra in NonNegative
            from r in Positive
            from mass in Positive
            select new PackRow(id, chemistry, s, p, mah, cont, cont + extra, r, mass),
            (pk, i) => pk with { Id = pk.Id + "#" + i });

    public static Gen<List<RotorRow>> Rotors =>
        Rows(
            from id in Text
            from m in Gen.Choose(2, 8)
            from waves in Gen.Choose(1, 12)
            from ro in Positive
            from fraction in Between(0, 0.999)
            from h in Positive
            from br in Between(0.05, 1.6)
            from beta in Between(-1, 1)
            from density in Optional(Positive)
            from mass in Positive
            from inertia in Positive
            from maxRpm in Positive
            from drag in Optional(NonNegative)
            from damping in Optional(NonNegative)
            from retained in Gen.Elements(true, false)
            from thickness in Positive
            from allowable in Positive
            select new RotorRow(id, m * waves, m, ro * fraction, ro, h, br, beta, density, mass, inertia, maxRpm, drag, damping,
                retained ? thickness : null, retained ? allowable : null),
            (r, i) => r with { Id = r.Id + "#" + i });

    public static Gen<List<PlateRow>> Plates =>
        Rows(
            from id in Text
            from sigma in Between(0.1, 70)
            from alpha in Between(-0.01, 0.01)
            from density in Positive
            from heat in Positive
            select new PlateRow(id, sigma, alpha, density, heat),
            (p, i) => p with { Id = p.Id + "#" + i });

    /// <summary>Curves of 2 to 20 points per chemistry: SoC strictly increasing in [0, 100], voltage non-decreasing in [0.5, 5].</summary>
    public static Gen<List<CellCurvePoint>> CellCurves =>
        Gen.ListOf(
            from chemistry in Text
            from socs in Gen.ArrayOf(Between(0, 100))
            from volts in Gen.ArrayOf(Between(0.5, 5))
            select (chemistry, socs, volts))
        .Select(curves => curves.SelectMany((c, i) =>
        {
            var socs = c.socs.Append(0).Append(100).Distinct().Order().ToArray();
            var volts = c.volts.Concat(Enumerable.Repeat(2.0, socs.Length)).Take(socs.Length).Order().ToArray();
            return socs.Select((s, k) => new CellCurvePoint(c.chemistry + "#" + i, s, volts[k]));
        }).ToList());

    /// <summary>Damaged versions of a valid file: random bytes (decoded as UTF-8), or 1 to 8 random edits of the text.</summary>
    public static Gen<string> Damaged(string valid)
    {
        var bytes = Gen.ArrayOf(Gen.Choose(0, 255).Select(b => (byte)b)).Select(b => System.Text.Encoding.UTF8.GetString(b));
        char[] alphabet = ",\"\n\r;. -0123456789eE+aZ#\t\u00e9\uFEFF".ToCharArray();
        var edit =
            from kind in Gen.Choose(0, 5)
            from position in Gen.Choose(0, int.MaxValue)
            from length in Gen.Choose(1, 40)
            from c in Gen.Elements(alphabet)
            select (kind, position, length, c);
        var edits = Gen.Zip(Gen.Choose(1, 8), Gen.ArrayOf(edit, 8), (n, all) => all.Take(n).ToArray())
            .Select(all => all.Aggregate(valid, Apply));
        return Gen.Frequency((1, bytes), (3, edits));
    }

    private static string Apply(string text, (int Kind, int Position, int Length, char C) e)
    {
        int at = text.Length == 0 ? 0 : e.Position % (text.Length + 1);
        int len = Math.Min(e.Length, text.Length - at);
        return e.Kind switch
        {
            0 => text.Insert(at, e.C.ToString()),
            1 => text.Remove(at, len),
            2 => text.Insert(at, text.Substring(at, len)),
            3 => text[..at] + new string(e.C, len) + text[(at + len)..],
            4 => text.Insert(at, e.C == ',' ? "NaN" : e.C == '"' ? "1e999" : "-"),
            _ => text[..at] + text[(at + len)..].ToUpperInvariant(),
        };
    }
}
