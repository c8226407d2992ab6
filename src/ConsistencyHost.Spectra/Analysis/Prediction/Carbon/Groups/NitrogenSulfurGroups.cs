using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

/// <summary>The nitrogen and sulfur rows of <see cref="GroupClassifier"/>.</summary>
internal static class NitrogenSulfurGroups
{
    /// <summary>Nitro, aromatic N, ammonium, azide, imine N, amide/sulfonamide N or amine by substitution.</summary>
    public static Group Nitrogen(PredictionContext context, int from, int atom)
    {
        var m = context.Molecule;
        if (Topology.DoubleBondedOxygens(m, atom) >= 1 || (m.Atoms[atom].Charge > 0 && Topology.CountNeighbours(m, atom, Topology.Oxygen) >= 2))
        {
            return Group.Nitro;
        }

        if (context.IsAromatic(atom))
        {
            return Group.AzoleNitrogen;
        }

        if (m.Atoms[atom].Charge > 0)
        {
            return Topology.PartnerByOrder(m, atom, 2, Topology.Nitrogen) >= 0 ? Group.Azido : Group.Ammonium;
        }

        if (Topology.PartnerByOrder(m, atom, 2) >= 0)
        {
            return Topology.PartnerByOrder(m, atom, 2, Topology.Nitrogen) >= 0 ? Group.Azido : Group.IminoNitrogen;
        }

        return Topology.PartnerByOrder(m, atom, 3) >= 0 ? Group.Other : AmineGroup(context, from, atom);
    }

    private static Group AmineGroup(PredictionContext context, int from, int atom)
    {
        var m = context.Molecule;
        var substituents = 0;
        foreach (var x in m.Neighbours(atom))
        {
            if (x == from)
            {
                continue;
            }

            substituents++;
            if (Topology.IsCarbonylCarbon(m, x))
            {
                return m.Atoms[atom].HydrogenCount > 0 ? Group.Amido : Group.DialkylAmido;
            }

            if (m.Atoms[x].AtomicNumber == Topology.Sulfur && Topology.DoubleBondedOxygens(m, x) >= 2)
            {
                return Group.Sulfonamido;
            }
        }

        return substituents switch { 0 => Group.Amino, 1 => Group.AlkylAmino, _ => Group.DialkylAmino };
    }

    /// <summary>Thiol, sulfide, sulfoxide or sulfone sulfur.</summary>
    public static Group Sulfur(Molecule m, int atom)
    {
        if (m.Atoms[atom].HydrogenCount > 0)
        {
            return Group.Thiol;
        }

        return Topology.DoubleBondedOxygens(m, atom) switch
        {
            >= 2 => Group.Sulfonyl,
            1 => Group.Sulfinyl,
            _ => m.Atoms[atom].Charge != 0 ? Group.Other : Group.Sulfide,
        };
    }
}
