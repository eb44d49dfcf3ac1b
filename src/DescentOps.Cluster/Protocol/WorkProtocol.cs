namespace DescentOps.Cluster.Protocol;

// The work-pulling conversation between a worker and the campaign node's dispatcher, in the order it happens. Every
// field is a string or a number, so the messages cross the network with Akka's default serializer unchanged; a run's
// record travels as the JSON of RunRecordCodec, whose numbers round-trip exactly.

/// <summary>Worker → dispatcher: a worker with this many slots and this build wants to take part.</summary>
public sealed record Hello(string Name, string ToolVersion, int Slots);

/// <summary>Dispatcher → worker: prove you hold the shared secret by keyed hash of this nonce (empty: no secret needed).</summary>
public sealed record Challenge(string Nonce);

/// <summary>Worker → dispatcher: HMAC-SHA256 of the nonce under the shared secret, hex (empty when no secret is needed).</summary>
public sealed record Proof(string Mac);

/// <summary>Dispatcher → worker: accepted; the campaign to run, as its stored settings (JSON of a string map).</summary>
public sealed record Welcome(string WorkerId, string SettingsJson);

/// <summary>Dispatcher → worker: not accepted, and why; the worker leaves the cluster.</summary>
public sealed record Refused(string Reason);

/// <summary>Worker → dispatcher: this many slots are free (work pulling: nothing is sent to a worker that did not ask).</summary>
public sealed record AskWork(int Slots);

/// <summary>Dispatcher → worker: run this one.</summary>
public sealed record Assign(string Variant, int Index, long Seed);

/// <summary>Worker → dispatcher: a finished run, its record as JSON.</summary>
public sealed record RunDone(string Variant, int Index, string RecordJson);

/// <summary>Worker → dispatcher: a run this worker will not finish (it is stopping).</summary>
public sealed record HandBack(string Variant, int Index);

/// <summary>Worker → dispatcher: the worker is leaving; everything it still holds goes to others.</summary>
public sealed record Leaving();

/// <summary>Dispatcher → worker: every run is done; stop asking.</summary>
public sealed record CampaignOver();

/// <summary>Worker → dispatcher: a run failed with an exception (a defect or a model's refusal); as in a local campaign, the campaign stops.</summary>
public sealed record RunFailed(string Variant, int Index, string Message);
