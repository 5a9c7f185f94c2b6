namespace RotorDrive.Core.Magnetics;

/// <summary>How a rotor's magnets are arranged around the ring.</summary>
public enum RotorArray
{
    /// <summary>A segmented Halbach array: M segments per wavelength, magnetisation turning by 2 pi / M from one to the next,
    /// strong face towards the plate (K. Halbach, Nucl. Instrum. Methods 169, 1980).</summary>
    Halbach,

    /// <summary>Alternating poles: axially magnetised magnets, north and south in turn (two per wavelength), each covering a
    /// fraction of its pole pitch, usually on a steel back disc.</summary>
    Alternating,
}
