using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.Dispatch;

/// <summary>An entry on its way to a replica, with the number of times it has been sent so far.</summary>
internal sealed record WorkItem(CheckEntryRequest Request, int Sends)
{
    public string EntryId => Request.EntryId;
}
