using System.Text;
using RotorDrive.Files;

namespace RotorDrive.Cli.Output;

/// <summary>The error stream of a <c>--json</c> run: passes everything through to the real stream and keeps the run's
/// input problems, so <see cref="CliApp"/> can print them as one JSON document when the run ends with bad input.</summary>
/// <remarks>Problems come structured from <see cref="ProblemReport"/> (file, line, column, field) and as the
/// "rotordrive COMMAND: error: ..." lines commands print for a problem that is not in a file (an option naming a
/// station the rig lacks, an existing output file).</remarks>
internal sealed class ProblemCollector(TextWriter inner) : TextWriter
{
    private const string ErrorMark = ": error: ";
    private readonly StringBuilder _line = new();
    private readonly List<InputProblem> _problems = [];
    private readonly List<string> _lines = [];

    public override Encoding Encoding => inner.Encoding;

    /// <summary>Every problem recorded, in order; when none was, every line written (so a refusal is never lost).</summary>
    public IReadOnlyList<InputProblem> Problems
        => _problems.Count > 0 ? _problems : _lines.Select(OfMessage).ToList();

    /// <summary>Records file problems; returns the real stream to print them on (so they are not read back as lines).</summary>
    public TextWriter Record(IEnumerable<InputProblem> problems)
    {
        _problems.AddRange(problems);
        return inner;
    }

    public override void Write(char value)
    {
        inner.Write(value);
        if (value == '\n')
        {
            EndLine();
        }
        else if (value != '\r')
        {
            _line.Append(value);
        }
    }

    public override void Write(string? value)
    {
        foreach (char c in value ?? "")
        {
            Write(c);
        }
    }

    public override void Write(char[] buffer, int index, int count)
    {
        for (int i = index; i < index + count; i++)
        {
            Write(buffer[i]);
        }
    }

    public override void Flush() => inner.Flush();

    private void EndLine()
    {
        string line = _line.ToString().Trim();
        _line.Clear();
        if (line.Length == 0)
        {
            return;
        }
        _lines.Add(line);
        int at = line.IndexOf(ErrorMark, StringComparison.Ordinal);
        if (at >= 0)
        {
            _problems.Add(OfMessage(line[(at + ErrorMark.Length)..]));
        }
    }

    /// <summary>A problem that is not in a file; an option the message starts with ("--gap-mm: ...") is its field.</summary>
    public static InputProblem OfMessage(string message)
    {
        string field = "";
        if (message.StartsWith("--", StringComparison.Ordinal))
        {
            int end = message.IndexOfAny([' ', ':']);
            field = end < 0 ? message : message[..end];
        }
        return new InputProblem("", 0, 0, field, message);
    }
}
