using System.Text;

namespace RotorDrive.Cli.Output;

/// <summary>Passes output through and remembers whether anything was written.</summary>
internal sealed class OutputProbe(TextWriter inner) : TextWriter
{
    public bool Written { get; private set; }

    public override Encoding Encoding => inner.Encoding;

    public override void Write(char value)
    {
        Written = true;
        inner.Write(value);
    }

    public override void Write(string? value)
    {
        Written |= !string.IsNullOrEmpty(value);
        inner.Write(value);
    }

    public override void Write(char[] buffer, int index, int count)
    {
        Written |= count > 0;
        inner.Write(buffer, index, count);
    }

    public override void Flush() => inner.Flush();
}
