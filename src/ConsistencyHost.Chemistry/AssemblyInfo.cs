// The chemistry core: molecule graph, structure readers, perception. No dependencies beyond the BCL.
[assembly: System.CLSCompliant(false)]
