using MathNet.Numerics.Random;

namespace RotorDrive.Core.Studies;

/// <summary>Independent, reproducible random streams for Monte Carlo samples: sample k's stream depends only on
/// (seed, k), never on thread scheduling or on how many samples ran before it.</summary>
/// <remarks>
/// <para>Each stream is a MathNet <see cref="Xoshiro256StarStar"/> (D. Blackman and S. Vigna, "Scrambled linear
/// pseudorandom number generators", ACM Trans. Math. Softw. 47(4), 2021), seeded with a 32-bit hash of (seed, k).
/// The hash is the SplitMix64 output function (G. L. Steele, D. Lea and C. H. Flood, "Fast splittable pseudorandom
/// number generators", OOPSLA 2014) applied to the seed, plus k, passed through the MurmurHash3 32-bit finaliser
/// (A. Appleby, 2011). The finaliser is a bijection of 32-bit words, so within one seed every sample index below 2^31
/// gets its own stream seed, and MathNet expands that seed into the 256-bit generator state with SplitMix64.</para>
/// <para>A stream is not thread-safe; each worker draws from its own sample's stream only.</para>
/// </remarks>
public static class SampleStreams
{
    /// <summary>The random stream of sample <paramref name="sampleIndex"/> in the study seeded with <paramref name="seed"/>.</summary>
    /// <param name="seed">The study's seed (for example the command line's --seed).</param>
    /// <param name="sampleIndex">Sample index, 0 or more.</param>
    /// <returns>A fresh generator (a MathNet random source, which is a <see cref="Random"/>).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="sampleIndex"/> is negative.</exception>
    public static Random ForSample(int seed, int sampleIndex) => new Xoshiro256StarStar(StreamSeed(seed, sampleIndex), threadSafe: false);

    /// <summary>The 32-bit seed of sample <paramref name="sampleIndex"/>'s stream; distinct for distinct indices of
    /// one study seed.</summary>
    /// <param name="seed">The study's seed.</param>
    /// <param name="sampleIndex">Sample index, 0 or more.</param>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="sampleIndex"/> is negative.</exception>
    public static int StreamSeed(int seed, int sampleIndex)
    {
        Preconditions.AtLeast(sampleIndex, 0, nameof(sampleIndex));
        uint key = (uint)SplitMix64((ulong)(uint)seed);
        return (int)Fmix32(unchecked(key + (uint)sampleIndex));
    }

    // SplitMix64 output function (Steele, Lea & Flood 2014), one step from state x.
    private static ulong SplitMix64(ulong x)
    {
        ulong z = unchecked(x + 0x9E3779B97F4A7C15UL);
        z = unchecked((z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL);
        z = unchecked((z ^ (z >> 27)) * 0x94D049BB133111EBUL);
        return z ^ (z >> 31);
    }

    // MurmurHash3 fmix32 (Appleby 2011): xor-shifts and odd multiplications, each invertible, so a bijection.
    private static uint Fmix32(uint h)
    {
        h ^= h >> 16;
        h = unchecked(h * 0x85EBCA6BU);
        h ^= h >> 13;
        h = unchecked(h * 0xC2B2AE35U);
        h ^= h >> 16;
        return h;
    }
}
