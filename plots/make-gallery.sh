#!/usr/bin/env bash
# Regenerates every figure in plots/ with the phaseslope CLI from the current source.
# Usage: bash plots/make-gallery.sh   (from anywhere; takes a few seconds after the build)
set -euo pipefail
cd "$(dirname "$0")/.."
dotnet build src/PhaseSlope.Cli --nologo -v quiet
ps=src/PhaseSlope.Cli/bin/Debug/net10.0/phaseslope
out=plots
ex=docs/examples

# Saturation pressure of five alkanes on a log axis.
$ps plot methane,ethane,propane,n-butane,n-pentane --diagram p-t --log --out $out/p-t-alkanes.png
# The invented FRC-7 fluid with its invented measurements overlaid (engineering units).
$ps plot $ex/frc-7.fluid --diagram p-t --data $ex/frc-7-vapour-pressure.csv --units engineering --out $out/p-t-frc7-data.png
# Corresponding states: ln(P/Pc) against Tc/T; water's larger acentric factor gives a steeper line.
$ps plot argon,methane,propane,water --diagram lnp-invt --reduced --out $out/lnp-invt-reduced.png
# Coexistence domes in reduced coordinates with their rectilinear diameters.
$ps plot argon,propane,water --diagram t-rho --reduced --out $out/t-rho-reduced.png
# Clapeyron slope of three refrigerants.
$ps plot r-134a,r-32,ammonia --diagram slope --units engineering --out $out/slope-refrigerants.png
# Latent heat of FRC-7 from the model and from the measurements, with the +-u band.
$ps plot $ex/frc-7.fluid --diagram latent --data $ex/frc-7-vapour-pressure.csv --units engineering --out $out/latent-frc7.png
# Residuals of the three best correlations (by AICc) fitted to the FRC-7 data.
$ps plot $ex/frc-7.fluid --diagram residuals --data $ex/frc-7-vapour-pressure.csv --out $out/residuals-frc7.png
# The invented FRC-7 fluid file's model and the model tuned to the data (from Tc and Pc only),
# each against the data.
tuned=$(mktemp -d)/frc-7-tuned.fluid
$ps tune $ex/frc-7-vapour-pressure.csv --tc 540K --pc 3.1MPa --name frc-7-tuned --out "$tuned" > /dev/null
$ps plot $ex/frc-7.fluid,"$tuned" --diagram deviations --data $ex/frc-7-vapour-pressure.csv --out $out/deviations-frc7-tuned.png
# Isotherms of carbon dioxide with the model's loops and the equal-area tie lines.
$ps plot carbon-dioxide --diagram p-v --out $out/p-v-carbon-dioxide.png
# T-s of water and P-h of R-134a in engineering units (P-h on the refrigeration reference, with isochores).
$ps plot water --diagram t-s --units engineering --out $out/t-s-water.png
$ps plot r-134a --diagram p-h --units engineering --reference refrigeration --isochores auto --out $out/p-h-r134a.png
# An invented operating point (not a measured or published system): R-134a evaporating at -10 degC,
# condensing at 40 degC, 5 K superheat, 3 K subcooling, compressor isentropic efficiency 0.75.
$ps plot r-134a --diagram p-h --units engineering --reference refrigeration --t-range "-40,120 degC" --p-range "0.5,60 bar" --h-range "150,480 kJ/kg" \
    --cycle "evaporating=-10 degC,condensing=40 degC,superheat=5 K,subcooling=3 K,efficiency=0.75" --out $out/p-h-r134a-cycle.png
# Whole phase diagrams: water (the model with the file's Mathias-Copeman alpha, so that its vapour
# pressure meets the sourced triple point) and carbon dioxide, whose melting line leaves the top.
$ps plot water --diagram phase --alpha mathias-copeman --out $out/phase-water.png
$ps plot carbon-dioxide --diagram phase --out $out/phase-carbon-dioxide.png
# One vector figure, to show the SVG output.
$ps plot propane,n-butane --diagram t-rho --out $out/t-rho-propane-butane.svg

ls -l $out
