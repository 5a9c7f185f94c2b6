using RotorDrive.Tui.Session;
using RotorDrive.Tui.Tests.Support;
using Xunit;

namespace RotorDrive.Tui.Tests.Session;

public class RigModelCacheTests
{
    private static RigSession Demo()
    {
        var session = new RigSession(MemoryFiles.WithDemoCatalogs());
        Assert.Null(session.Open("/lab/demo-rig.json"));
        return session;
    }

    [Fact]
    public async Task SheetsAskingAtOnce_ShareOneModel_AndAnEditedRigGetsANewOne()
    {
        var session = Demo();
        var cache = new RigModelCache();
        var rig = session.Rig!;
        var models = await Task.WhenAll(Enumerable.Range(0, 4).Select(_ => Task.Run(() => cache.For(rig))));
        Assert.All(models, m => Assert.Same(models[0], m));
        Assert.Same(rig, models[0].Rig);

        session.Edit("$.gap.design_mm", d => d.Gap!.DesignMm = 11);
        var edited = cache.For(session.Rig!);
        Assert.NotSame(models[0], edited);
        Assert.Equal(0.011, edited.DesignGapM, 12);
    }
}
