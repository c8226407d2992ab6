using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

/// <summary>Names the substituent that an atom starts, seen from its neighbour (the carbon the table is about).</summary>
/// <remarks>Functional-group perception by element, bond orders and the next shell of atoms, as the increment
/// tables define their rows (common practice).</remarks>
internal static class GroupClassifier
{
    /// <summary>The group that <paramref name="atom"/> starts, seen from <paramref name="from"/>.</summary>
    public static Group Classify(PredictionContext context, int from, int atom)
    {
        var m = context.Molecule;
        return m.Atoms[atom].AtomicNumber switch
        {
            Topology.Carbon => CarbonGroup(context, from, atom),
            Topology.Oxygen => OxygenGroup(context, from, atom),
            Topology.Nitrogen => NitrogenSulfurGroups.Nitrogen(context, from, atom),
            Topology.Sulfur => NitrogenSulfurGroups.Sulfur(m, atom),
            9 => Group.Fluoro,
            17 => Group.Chloro,
            35 => Group.Bromo,
            53 => Group.Iodo,
            14 => Group.Silyl,
            15 => Group.Phosphorus,
            5 => Group.Boron,
            _ => Group.Other,
        };
    }

    private static Group CarbonGroup(PredictionContext context, int from, int atom)
    {
        var m = context.Molecule;
        if (context.IsAromatic(atom))
        {
            return Group.Aryl;
        }

        if (Topology.IsSp3Carbon(context, atom))
        {
            return Topology.CountNeighbours(m, atom, 9) >= 3 ? Group.Trifluoromethyl : Group.Alkyl;
        }

        if (Topology.PartnerByOrder(m, atom, 3) is var triple and >= 0)
        {
            return m.Atoms[triple].AtomicNumber == Topology.Nitrogen ? Group.Nitrile : Group.Alkynyl;
        }

        if (Topology.PartnerByOrder(m, atom, 2, Topology.Oxygen) is var oxo and >= 0)
        {
            return AcylGroup(context, from, atom, oxo);
        }

        if (Topology.PartnerByOrder(m, atom, 2, Topology.Sulfur) >= 0)
        {
            return Group.Thioacyl;
        }

        if (Topology.PartnerByOrder(m, atom, 2, Topology.Nitrogen) >= 0)
        {
            return Group.Imidoyl;
        }

        return Topology.PartnerByOrder(m, atom, 2, Topology.Carbon) >= 0 ? Group.Vinyl : Group.Other;
    }

    private static Group AcylGroup(PredictionContext context, int from, int carbonyl, int oxo)
    {
        var m = context.Molecule;
        var other = -1;
        foreach (var x in m.Neighbours(carbonyl))
        {
            if (x != from && x != oxo)
            {
                other = x;
            }
        }

        if (other < 0)
        {
            return Group.Formyl;
        }

        var atom = m.Atoms[other];
        return atom.AtomicNumber switch
        {
            Topology.Oxygen when atom.Charge < 0 => Group.Carboxylate,
            Topology.Oxygen when atom.HydrogenCount > 0 => Group.CarboxylicAcid,
            Topology.Oxygen => Group.Ester,
            Topology.Nitrogen => Group.Amide,
            9 or 17 or 35 => Group.AcylHalide,
            _ => Group.Acyl,
        };
    }

    private static Group OxygenGroup(PredictionContext context, int from, int atom)
    {
        var m = context.Molecule;
        if (m.Atoms[atom].Charge < 0)
        {
            return Group.Alkoxide;
        }

        if (m.Atoms[atom].HydrogenCount > 0)
        {
            return Group.Hydroxy;
        }

        foreach (var x in m.Neighbours(atom))
        {
            if (x != from)
            {
                return BeyondOxygen(context, x);
            }
        }

        return Group.Other;
    }

    private static Group BeyondOxygen(PredictionContext context, int next)
    {
        var m = context.Molecule;
        var z = m.Atoms[next].AtomicNumber;
        if (z == Topology.Carbon)
        {
            return context.IsAromatic(next) ? Group.Aryloxy
                : Topology.IsCarbonylCarbon(m, next) ? Group.Acyloxy
                : Group.Alkoxy;
        }

        return z switch
        {
            Topology.Sulfur when Topology.DoubleBondedOxygens(m, next) >= 2 => Group.Sulfonyloxy,
            14 => Group.Silyloxy,
            _ => Group.Alkoxy,
        };
    }
}
