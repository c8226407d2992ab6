using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>
/// CH3–X carbons where X is not an sp3 carbon: tabulated by X and the next shell (the increment sums are poorest
/// for methyls on heteroatoms and π systems).
/// </summary>
/// <remarks>
/// Values (ppm, CDCl3) from memory of the CH3–X tables of Pretsch, Bühlmann and Badertscher (2009) and of
/// Kalinowski, Berger and Braun, Carbon-13 NMR Spectroscopy (1988), checked against Gottlieb et al., J. Org. Chem.
/// 1997, 62, 7512 and Fulmer et al., Organometallics 2010, 29, 2176 for acetone, acetic acid, acetonitrile,
/// ethyl acetate, DMF, DMSO, methanol and MTBE. Half-widths span the family (e.g. anisoles 55–56, 2,6-disubstituted
/// 60–62).
/// </remarks>
internal static class MethylCarbons
{
    /// <summary>The tabulated window of methyl <paramref name="carbon"/> bonded to <paramref name="x"/>, or none.</summary>
    public static Tabulated Lookup(PredictionContext context, int carbon, int x)
    {
        var group = GroupClassifier.Classify(context, carbon, x);
        return group switch
        {
            Group.Aryl => MethylAromatic.Lookup(context, x),
            Group.Vinyl => OnAlkene(context, x),
            Group.Alkynyl => new(3.5, 2.5, "CH3–C≡C"),
            Group.Nitrile => new(1.5, 2.0, "CH3–C≡N"),
            Group.Acyl or Group.Formyl => MethylCarbonyl.Ketone(context, carbon, x),
            Group.Ester => new(21.0, 2.3, "CH3–C(O)OR"),
            Group.CarboxylicAcid => new(20.9, 2.3, "CH3–COOH"),
            Group.Carboxylate => new(23.5, 2.5, "CH3–COO⁻"),
            Group.Amide => MethylCarbonyl.Amide(context, carbon, x),
            Group.AcylHalide => new(33.5, 2.5, "CH3–COX"),
            Group.Imidoyl => new(16.0, 6.0, "CH3–C=N"),
            Group.Thioacyl => new(33.0, 5.0, "CH3–C=S"),
            Group.Hydroxy or Group.Alkoxide => new(49.8, 2.3, "CH3–OH"),
            Group.Alkoxy or Group.Silyloxy or Group.Sulfonyloxy => MethylHetero.Ether(context, carbon, x),
            Group.Aryloxy => MethylHetero.ArylEther(context, carbon, x),
            Group.Acyloxy => MethylHetero.EsterOxygen(context, carbon, x),
            Group.Amino or Group.AlkylAmino or Group.DialkylAmino => MethylHetero.Amine(context, carbon, x),
            Group.Amido or Group.DialkylAmido => MethylHetero.AmideNitrogen(context, carbon, x),
            Group.Sulfonamido => new(33.5, 5.0, "CH3–N–SO2"),
            Group.AzoleNitrogen => context.Molecule.Atoms[x].Charge > 0 ? new(42.0, 8.0, "CH3–N⁺(aromatic)") : new(34.0, 6.5, "CH3–N(azole)"),
            Group.Ammonium => new(52.0, 4.5, "CH3–N⁺"),
            Group.IminoNitrogen => new(47.0, 6.0, "CH3–N=C"),
            Group.Nitro => new(61.5, 3.0, "CH3–NO2"),
            Group.Azido => new(39.0, 4.0, "CH3–N3"),
            Group.Thiol or Group.Sulfide => new(15.3, 4.0, "CH3–S"),
            Group.Sulfinyl => new(41.0, 3.5, "CH3–S(O)"),
            Group.Sulfonyl => MethylSulfurSilicon.Sulfone(context, carbon, x),
            Group.Fluoro => new(75.0, 4.0, "CH3–F"),
            Group.Chloro => new(25.6, 3.0, "CH3–Cl"),
            Group.Bromo => new(10.0, 3.0, "CH3–Br"),
            Group.Iodo => new(-21.0, 4.0, "CH3–I"),
            Group.Silyl => MethylSulfurSilicon.Silicon(context, x),
            Group.Phosphorus => new(13.0, 7.0, "CH3–P"),
            Group.Boron => new(5.0, 8.0, "CH3–B"),
            _ => default,
        };
    }

    private static Tabulated OnAlkene(PredictionContext context, int alkeneCarbon)
    {
        // Propene 19.4, (E)-2-butene 17.6, (Z)-2-butene 12.0, isobutylene 24.2, 2-methyl-2-butene 25.7/17.3/13.4.
        var m = context.Molecule;
        var partner = Topology.PartnerByOrder(m, alkeneCarbon, 2);
        var geminal = m.Degree(alkeneCarbon) >= 3;
        var partnerSubstituted = partner >= 0 && m.Degree(partner) >= 2;
        var low = partnerSubstituted ? 11.0 : 15.0;
        var high = geminal ? 27.5 : 22.5;
        return new((low + high) / 2, (high - low) / 2, "CH3–C=C");
    }
}
