namespace RotorDrive.Core.Magnetics;

/// <summary>One circumferential harmonic of a rotor's magnetisation, per unit remanence.</summary>
/// <remarks>The magnetisation pattern of harmonic n is m_z = Az cos(n k x), m_x = At sin(n k x) with k = p / r the
/// fundamental wavenumber (for a Halbach array the complex form m_z + i m_x = sum a_n e^(i n k x)). A negative order is a
/// harmonic whose magnetisation turns the other way: in two dimensions its field is all on the array's weak side.</remarks>
/// <param name="Order">Harmonic order n (signed); its wavenumber is |n| p / r.</param>
/// <param name="AxialAmplitude">Amplitude Az of the axial (normal) magnetisation, per unit remanence.</param>
/// <param name="TangentialAmplitude">Amplitude At of the circumferential magnetisation, per unit remanence.</param>
public readonly record struct SourceHarmonic(int Order, double AxialAmplitude, double TangentialAmplitude);
