using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Correlations.Audit;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Correlations.Audit;

/// <summary>The exact conversion both ways between SI parameters (ln(P/Pa), T in K) and a printed
/// set in a published convention, with its Jacobian for the covariance.</summary>
public class PublishedConversionTests
{
    private static PublishedConvention C(LogBase b, PublishedPressureUnit p, PublishedTemperatureUnit t) => new(b, p, t);

    /// <summary>Conventions spanning every log base, pressure unit and temperature scale.</summary>
    private static readonly PublishedConvention[] Conventions =
    [
        C(LogBase.E, PublishedPressureUnit.Pa, PublishedTemperatureUnit.Kelvin),
        C(LogBase.Ten, PublishedPressureUnit.MmHg, PublishedTemperatureUnit.Celsius),
        C(LogBase.Ten, PublishedPressureUnit.Bar, PublishedTemperatureUnit.Kelvin),
        C(LogBase.E, PublishedPressureUnit.KPa, PublishedTemperatureUnit.Fahrenheit),
        C(LogBase.Ten, PublishedPressureUnit.Psi, PublishedTemperatureUnit.Rankine),
        C(LogBase.E, PublishedPressureUnit.Atm, PublishedTemperatureUnit.Rankine),
        C(LogBase.Ten, PublishedPressureUnit.Torr, PublishedTemperatureUnit.Fahrenheit),
        C(LogBase.E, PublishedPressureUnit.MPa, PublishedTemperatureUnit.Celsius),
    ];

    /// <summary>Every fitted form on noise-free IAPWS water data (Wagner &amp; Pruss 1993, from
    /// memory; <see cref="SyntheticSaturationData.WaterFits"/>), plus the extended Antoine form
    /// holding the DIPPR-101-type water set of Perry's Chemical Engineers' Handbook, 7th ed.,
    /// Table 2-6 (ln(P/Pa) = 73.649 − 7258.2/T − 7.3037 ln T + 4.1653e-6 T², from memory) as
    /// A, B, C = 0, D = 0, E, F, G = 2.</summary>
    private static IEnumerable<(VapourPressureForm Form, double[] Parameters, double[,]? Covariance)> Sets()
    {
        foreach (var fit in SyntheticSaturationData.WaterFits())
        {
            yield return (fit.Form, [.. fit.Parameters], fit.Covariance);
        }

        yield return (new ExtendedAntoineForm(), PerryWater, null);
    }

    private static readonly double[] PerryWater = [73.649, -7258.2, 0, 0, -7.3037, 4.1653e-6, 2];

    [Fact]
    public void FromSi_then_ToSi_reproduces_every_pressure_to_1e_10()
    {
        // Each conversion is a few floating-point operations per coefficient; the terms of ln P
        // (up to ~100 in magnitude for the Kirchhoff and Riedel forms, which cancel to ln P ~ 10)
        // carry ~1e-14 relative rounding each, so ln P moves by ~1e-13 at most: 1e-10 is the
        // brief's requirement with three orders of margin.
        int checkedCount = 0;
        foreach (var (form, si, _) in Sets())
        {
            foreach (var convention in Conventions)
            {
                if (PublishedCorrelation.Refusal(form.Id, convention.LogBase, convention.TemperatureUnit) is not null)
                {
                    continue;
                }

                var printed = PublishedCorrelation.FromSi(form, si, convention);
                var (back, parameters) = printed.ToSi(convention);
                foreach (double t in SyntheticSaturationData.Temperatures(280, 600, 17))
                {
                    AssertClose.Relative(Math.Exp(form.LnPressure(t, si)), Math.Exp(back.LnPressure(t, parameters)), 1e-10, $"{form.Id} in {convention} at {t} K");
                }

                checkedCount++;
            }
        }

        // 8 forms; the four absolute-temperature forms take the 4 conventions in K or degR,
        // Antoine all 8, the three Wagner forms the 4 in base e.
        Assert.Equal(4 * 4 + 8 + 3 * 4, checkedCount);
    }

    [Fact]
    public void Lange_water_set_in_Fahrenheit_matches_the_hand_algebra()
    {
        // Lange's Handbook water set, log10(P/mmHg) = 8.07131 − 1730.63/(t/°C + 233.426) (from
        // memory). With t_C = (t_F − 32)/1.8: log P = A − 1.8B/(t_F + 1.8C − 32), so in °F
        // A = 8.07131, B = 3115.134, C = 388.1668 (worked by hand).
        var celsius = C(LogBase.Ten, PublishedPressureUnit.MmHg, PublishedTemperatureUnit.Celsius);
        var fahrenheit = C(LogBase.Ten, PublishedPressureUnit.MmHg, PublishedTemperatureUnit.Fahrenheit);
        var (form, si) = new PublishedCorrelation("antoine", [8.07131, 1730.63, 233.426]).ToSi(celsius);
        var printed = PublishedCorrelation.FromSi(form, si, fahrenheit);
        // Rounding only (a few ulps of numbers ~1e3 through ln 10 and back): 1e-12 relative.
        AssertClose.Relative(8.07131, printed.Coefficients[0], 1e-12, "A");
        AssertClose.Relative(3115.134, printed.Coefficients[1], 1e-12, "B");
        AssertClose.Relative(388.1668, printed.Coefficients[2], 1e-12, "C");
    }

    [Fact]
    public void Perry_water_set_in_the_extended_form_follows_the_IAPWS_curve()
    {
        // The extended form evaluated independently: the Perry set against the IAPWS equation
        // (Wagner & Pruss 1993, from memory). A five-constant set fitted over the whole liquid
        // range is expected to stay within about 1 % of the reference curve well below Tc
        // (common practice for such compilations); a wrong evaluation of any term (T², ln T,
        // the pole) would be off by orders of magnitude.
        var form = new ExtendedAntoineForm();
        foreach (double t in SyntheticSaturationData.Temperatures(280, 600, 17))
        {
            AssertClose.Relative(Math.Exp(SyntheticSaturationData.WaterLnPressure(t)), Math.Exp(form.LnPressure(t, PerryWater)), 0.01, $"Perry water at {t} K");
        }
    }

    [Fact]
    public void Jacobian_matches_central_differences_of_FromSi()
    {
        // Central differences with step 1e-6·|θ| (1e-6 for a zero θ): the maps are linear in every
        // parameter but the extended form's (F, G) pair, whose second-order error is ~(1e-6·ln 1.8)²;
        // rounding ~1e-16/1e-6 relative. 1e-6 relative (or 1e-9 absolute near zero) covers both.
        foreach (var (form, si, _) in Sets())
        {
            foreach (var convention in Conventions.Where(c => PublishedCorrelation.Refusal(form.Id, c.LogBase, c.TemperatureUnit) is null))
            {
                var j = PublishedCorrelation.Jacobian(form, si, convention);
                for (int col = 0; col < si.Length; col++)
                {
                    double h = si[col] == 0 ? 1e-6 : 1e-6 * Math.Abs(si[col]);
                    double[] up = [.. si], down = [.. si];
                    up[col] += h;
                    down[col] -= h;
                    var pu = PublishedCorrelation.FromSi(form, up, convention).Coefficients;
                    var pd = PublishedCorrelation.FromSi(form, down, convention).Coefficients;
                    for (int row = 0; row < si.Length; row++)
                    {
                        double fd = (pu[row] - pd[row]) / (2 * h);
                        Assert.True(Math.Abs(fd - j[row, col]) <= 1e-6 * Math.Abs(fd) + 1e-9,
                            $"{form.Id} {convention}: dP{row}/dS{col} = {j[row, col]}, central difference {fd}");
                    }
                }
            }
        }
    }

    [Fact]
    public void Printed_covariance_gives_the_same_ln_pressure_uncertainty()
    {
        // The delta method in either parameterisation must agree: u(ln P) from the SI covariance
        // and gradient, and from J·Σ·Jᵀ with the printed set's own gradient (by central
        // differences, step 1e-7 relative: truncation and rounding ~1e-7 relative), to 1e-5.
        var noisy = VapourPressureFitter.Fit(new AntoineForm(),
            SyntheticSaturationData.Points(SyntheticSaturationData.WaterLnPressure, SyntheticSaturationData.Temperatures(300, 420, 25), 0.002, new Random(7)));
        var convention = C(LogBase.Ten, PublishedPressureUnit.MmHg, PublishedTemperatureUnit.Fahrenheit);
        var printed = PublishedCorrelation.FromSi(noisy.Form, noisy.Parameters, convention);
        var covariance = PublishedCorrelation.Covariance(noisy.Form, noisy.Parameters, noisy.Covariance, convention);
        const double t = 360;
        double[] g = new double[3];
        for (int i = 0; i < 3; i++)
        {
            double[] up = [.. printed.Coefficients], down = [.. printed.Coefficients];
            double h = 1e-7 * Math.Abs(up[i]);
            up[i] += h;
            down[i] -= h;
            double lnUp = new PublishedCorrelation("antoine", up).ToSi(convention) is var (f1, s1) ? f1.LnPressure(t, s1) : 0;
            double lnDown = new PublishedCorrelation("antoine", down).ToSi(convention) is var (f2, s2) ? f2.LnPressure(t, s2) : 0;
            g[i] = (lnUp - lnDown) / (2 * h);
        }

        double variance = 0;
        for (int i = 0; i < 3; i++)
        {
            for (int k = 0; k < 3; k++)
            {
                variance += g[i] * covariance[i, k] * g[k];
            }
        }

        AssertClose.Relative(noisy.LnPressureStandardUncertainty(t), Math.Sqrt(variance), 1e-5, "u(ln P) at 360 K");
    }

    [Theory]
    [InlineData("antoine", LogBase.Ten, PublishedTemperatureUnit.Fahrenheit, true)]
    [InlineData("antoine", LogBase.E, PublishedTemperatureUnit.Celsius, true)]
    [InlineData("kirchhoff", LogBase.Ten, PublishedTemperatureUnit.Rankine, true)]
    [InlineData("kirchhoff", LogBase.Ten, PublishedTemperatureUnit.Celsius, false)]
    [InlineData("clausius-clapeyron", LogBase.E, PublishedTemperatureUnit.Fahrenheit, false)]
    [InlineData("riedel", LogBase.E, PublishedTemperatureUnit.Celsius, false)]
    [InlineData("antoine-extended", LogBase.Ten, PublishedTemperatureUnit.Celsius, false)]
    [InlineData("wagner-3-6", LogBase.E, PublishedTemperatureUnit.Celsius, true)]
    [InlineData("wagner-2.5-5", LogBase.Ten, PublishedTemperatureUnit.Kelvin, false)]
    [InlineData("wagner-6", LogBase.Ten, PublishedTemperatureUnit.Kelvin, false)]
    public void Refusal_allows_only_what_the_algebra_allows(string form, LogBase logBase, PublishedTemperatureUnit scale, bool allowed)
    {
        // Terms in 1/T and ln T need an absolute scale; the Wagner forms are ln(P/Pc) by definition.
        Assert.Equal(allowed, PublishedCorrelation.Refusal(form, logBase, scale) is null);
    }

    [Fact]
    public void Wagner_Tc_and_Pc_print_in_the_stated_units()
    {
        // IAPWS Tc = 647.096 K, Pc = 22.064 MPa (Wagner & Pruss 1993, from memory): in degF,
        // 1.8·647.096 − 459.67 = 705.1028; in psi, 22.064e6/6894.757293168 = 3200.11… (exact
        // decimal conversion through the unit table, then compared to 1e-12 relative: rounding).
        var fit = SyntheticSaturationData.WaterFits().Single(f => f.Form.Id == "wagner-6");
        var printed = PublishedCorrelation.FromSi(fit.Form, fit.Parameters, C(LogBase.E, PublishedPressureUnit.Psi, PublishedTemperatureUnit.Fahrenheit));
        Assert.Equal(fit.Parameters, printed.Coefficients.Take(6));
        AssertClose.Relative(705.1028, printed.Coefficients[6], 1e-12, "Tc in degF");
        AssertClose.Relative(22.064e6 / 6894.757293168, printed.Coefficients[7], 1e-12, "Pc in psi");
    }
}
