using RotorDrive.Core.Craft;
using Xunit;

namespace RotorDrive.Core.Tests.Craft;

// Issue 14 item 4: the yaw authority names the limit met at the edge of the feasible trims, not the first failure of the
// doubling search (which can lie far beyond the edge, where other limits have failed too). Three variants of the
// four-rotor test rig, each with a different binding limit; the yaw tolerance of 0.3 N m makes the search's doubling
// probes (0.3, 0.6, 1.2, 2.4 N m) overshoot the edge (1.4 to 2.0 N m) into trims that are beyond the duty limit.
public sealed class YawAuthorityLimitTests
{
    private static RigModel Variant(double maxDuty = 0.95, double motorMaxCurrentA = 80, double controllerMaxErpm = 240_000)
    {
        Rig rig = CraftRigs.Circle(4);
        return CraftRigs.Model(rig with
        {
            Limits = rig.Limits with { MaxDuty = maxDuty, YawTorqueNm = 0.3 },
            Stations = rig.Stations.Select(s => s with
            {
                Motor = s.Motor! with { MaxCurrentA = motorMaxCurrentA },
                Controller = s.Controller! with { MaxErpm = controllerMaxErpm },
            }).ToArray(),
        });
    }

    // Duty 0.85: the fast pair reaches the duty limit first. Motor limit 40 A: the slow pair reaches 40 A first (the
    // rotors hover above their drag peak, where the slower rotor has the larger shaft torque). Controller 25 000 erpm:
    // the fast pair reaches it (14 poles, about 3570 rpm) before its duty limit.
    public static TheoryData<string, double, double, double> Rigs => new()
    {
        { "duty_headroom", 0.85, 80, 240_000 },
        { "motor_current", 0.95, 40, 240_000 },
        { "controller_erpm", 0.95, 80, 25_000 },
    };

    [Theory]
    [MemberData(nameof(Rigs))]
    public void YawAuthority_NamesTheLimitMetAtTheEdge(string binding, double maxDuty, double motorMaxCurrentA, double controllerMaxErpm)
    {
        RigModel model = Variant(maxDuty, motorMaxCurrentA, controllerMaxErpm);
        YawResult yaw = YawBalance.Analyse(model);
        double authority = Math.Min(yaw.AuthorityPositiveNm, yaw.AuthorityNegativeNm);
        int sign = yaw.AuthorityPositiveNm <= yaw.AuthorityNegativeNm ? 1 : -1;
        Assert.InRange(authority, 0.3, 2.4);

        // The edge checked directly: the trim holds at the authority and fails 1 % beyond it on the named limit only.
        Assert.Equal(HoverStatus.Hovering, HoverTrim.Solve(model, CraftRigs.Gap, sign * authority).Status);
        HoverResult beyond = HoverTrim.Solve(model, CraftRigs.Gap, sign * authority * 1.01);
        Assert.NotEqual(HoverStatus.Hovering, beyond.Status);
        Assert.Contains(beyond.Findings, f => f.Limit == binding);
        Assert.DoesNotContain(beyond.Findings, f => f.Station is not null && f.Limit != binding);

        Assert.Equal(binding, yaw.AuthorityLimitedBy);
    }
}
