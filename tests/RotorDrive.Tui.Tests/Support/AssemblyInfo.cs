using Xunit;

// Terminal.Gui keeps some process-wide state (default key bindings, the current instance); UI tests run one at a time.
[assembly: CollectionBehavior(DisableTestParallelization = true)]
