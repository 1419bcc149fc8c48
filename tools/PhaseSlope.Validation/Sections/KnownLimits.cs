using PhaseSlope.Core;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Validation.Sections;

internal static class KnownLimits
{
    public static void Write(Page page)
    {
        page.Heading(2, "Known limits of the models");
        var propane = FluidCatalog.Embedded.Find("propane");
        double tb = propane.NormalBoilingPoint!.Value;
        double low = CoexistenceSolver.LowestValidTemperature(propane);
        double zra = VolumeShift.RackettCompressibility(propane.AcentricFactor.Value);
        string Densities(CubicModelKind kind)
        {
            // As VolumeShiftTests computes them: the liquid at Tb, untranslated and with the Péneloux shift.
            var model = CubicModel.For(kind, propane);
            double c = VolumeShift.Peneloux(kind, model.CriticalTemperature, model.CriticalPressure, zra);
            double Rho(CubicModel m) => new CoexistenceSolver(m, low).AtTemperature(tb).Liquid.Density * propane.MolarMass!.Value;
            return $"{Fmt.F(Rho(model), 1)} to {Fmt.F(Rho(model.WithVolumeShift(c)), 1)} kg/m³";
        }

        double vdwTb = CoexistenceSolver.For(propane, CubicModelKind.VanDerWaals).AtPressure(Constants.StandardAtmosphere).Temperature;
        page.Bullets([
            $"""
            Saturated-liquid densities from two-parameter cubics are poor. The Péneloux translation (`--volume-shift
              peneloux`) fixes much of this without changing vapour pressures: for propane at its normal boiling point
              against {References.PropaneLiquidDensityAtTb} kg/m³ (Lemmon et al. 2009; from memory) Soave–Redlich–Kwong goes from
              {Densities(CubicModelKind.SoaveRedlichKwong)} and Peng–Robinson from {Densities(CubicModelKind.PengRobinson)}
              (`Models/VolumeShiftTests`: within 2.5 % after, and at least twice as close as before).
            """,
            $"""
            Liquid derivative properties (expansivity, compressibility, sound speed) inherit the cubic's liquid
              errors; for liquid toluene at 25 °C and 1 atm Peng–Robinson's internal pressure is {Fmt.E2(TolueneInternalPressure())} Pa against
              about {Fmt.E2(References.TolueneInternalPressure)} Pa from handbook expansivity and compressibility ({References.Crc}; not a test).
            """,
            """
            Near the critical point every cubic is mean-field: the coexistence curve closes with exponent 1/2
              instead of the real ≈ 0.326, so densities and latent heats within a few percent of Tc are
              qualitatively, not quantitatively, right.
            """,
            $"""
            The Redlich–Kwong and van der Waals models are included for comparison; their vapour pressures are far
              off for most fluids (van der Waals puts propane's normal boiling point at {Fmt.F(vdwTb, 1)} K against the
              catalog's {tb} K).
            """,
        ]);
    }

    private static double TolueneInternalPressure()
    {
        var toluene = FluidCatalog.Embedded.Find("toluene");
        var engine = new PhaseSlope.Core.Properties.PropertyModel(toluene, CubicModel.For(CubicModelKind.PengRobinson, toluene));
        return engine.AtPressure(298.15, Constants.StandardAtmosphere).InternalPressure;
    }
}
