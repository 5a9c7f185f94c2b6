using RotorDrive.Tui.Text;
using Xunit;

namespace RotorDrive.Tui.Tests.Text;

public class FieldWordsTests
{
    [Theory]
    // The rig file's keys (catalogs/README.md, "The rig file") against the labels the workbench's editors show them by.
    [InlineData("$.stations[0].x_mm", "station 1, x forward")]
    [InlineData("$.stations[5].motor", "station 6, motor")]
    [InlineData("$.stations[2]", "station 3")]
    [InlineData("$.gap.design_mm", "design gap")]
    [InlineData("$.craft.payload_kg", "payload")]
    [InlineData("$.limits.max_duty", "max duty")]
    [InlineData("$.tolerances.gap_offset_mm", "tolerances gap offset")]
    [InlineData("motors.csv", "motors.csv")]
    public void RigFileKeys_ReadAsTheEditorsLabels(string key, string words)
        => Assert.Equal(words, FieldWords.Of(key));

    [Theory]
    // Stress input names as Core's stress study writes them (stations counted from 1, issue 14 item 6).
    [InlineData("gap_offset[3]", "gap offset, station 3")]
    [InlineData("motor_kv[1]", "motor Kv, station 1")]
    [InlineData("pack_soc", "pack state of charge")]
    [InlineData("plate_conductivity", "plate conductivity")]
    public void StressInputs_ReadAsWords(string input, string words)
        => Assert.Equal(words, FieldWords.Input(input));
}
