using BenchRunner.Instruments.Capabilities;
using BenchRunner.Instruments.Errors;
using BenchRunner.Instruments.Kinds;
using Polly;
using Polly.CircuitBreaker;
using Polly.Retry;
using Polly.Timeout;

namespace BenchRunner.Instruments.Resilience;

/// <summary>
/// Wraps an instrument adapter with the project's resilience rules (Polly): a timeout per
/// operation, retries with exponential backoff for idempotent operations after a transient
/// failure, a reconnect before each retry (a fresh adapter from the factory, with the last
/// settings applied again), and a circuit breaker for this instrument alone. Operations on one
/// instrument run one at a time. Cancellation by the caller is never retried. Each capability is
/// wrapped by the <see cref="InstrumentKind"/> that provides it.
/// </summary>
public sealed class ResilientInstrument : IInstrument
{
    private static readonly ResiliencePropertyKey<TimeSpan> TimeoutKey = new("benchrunner.timeout");
    private static readonly ResiliencePropertyKey<bool> IdempotentKey = new("benchrunner.idempotent");

    private readonly Func<IInstrument> _factory;
    private readonly InstrumentKindRegistry _kinds;
    private readonly InstrumentResilienceOptions _options;
    private readonly ResiliencePipeline _pipeline;
    private readonly SemaphoreSlim _gate = new(1, 1);
    private readonly List<Func<IInstrument, CancellationToken, Task>> _restorers = [];
    private readonly Dictionary<Type, object?> _capabilities = [];
    private IInstrument? _current;
    private IInstrument? _lastConnected;

    /// <summary>Creates the wrapper. Nothing is opened until <see cref="ConnectAsync"/>.</summary>
    /// <param name="name">The instrument's bench name, used in every message.</param>
    /// <param name="factory">Creates a fresh, unconnected adapter (called again to reconnect).</param>
    /// <param name="options">Timeouts, retries and breaker settings; validated here.</param>
    /// <param name="timeProvider">The clock for timeouts, backoff and the breaker.</param>
    /// <param name="kinds">
    /// The kinds whose capabilities can be wrapped, each by its <see cref="InstrumentKind"/>;
    /// <see cref="InstrumentKindRegistry.BuiltIn"/> when null.
    /// </param>
    public ResilientInstrument(string name, Func<IInstrument> factory, InstrumentResilienceOptions? options = null, TimeProvider? timeProvider = null,
        InstrumentKindRegistry? kinds = null)
    {
        ArgumentException.ThrowIfNullOrEmpty(name);
        ArgumentNullException.ThrowIfNull(factory);
        Name = name;
        _factory = factory;
        _kinds = kinds ?? InstrumentKindRegistry.BuiltIn;
        _options = options ?? new InstrumentResilienceOptions();
        _options.Validate();
        _pipeline = BuildPipeline(_options, timeProvider ?? TimeProvider.System);
    }

    /// <inheritdoc/>
    public string Name { get; }

    /// <inheritdoc/>
    public InstrumentIdentity Identity => _lastConnected?.Identity ?? InstrumentIdentity.Unknown;

    /// <inheritdoc/>
    public InstrumentLimits Limits => _lastConnected?.Limits ?? InstrumentLimits.None;

    /// <summary>The options in force.</summary>
    public InstrumentResilienceOptions Options => _options;

    /// <summary>How many times a fresh adapter has been connected (1 after the first connection).</summary>
    public int ConnectionCount { get; private set; }

    /// <inheritdoc/>
    public Task ConnectAsync(CancellationToken cancellationToken) =>
        ExecuteAsync<bool>("connect", idempotent: true, _options.OperationTimeout, (_, _) => Task.FromResult(true), cancellationToken);

    /// <inheritdoc/>
    public T? GetCapability<T>() where T : class
    {
        var inner = _lastConnected ?? throw new InvalidOperationException($"{Name}: connect before asking for capabilities.");
        lock (_capabilities)
        {
            if (!_capabilities.TryGetValue(typeof(T), out var wrapper))
            {
                wrapper = inner.GetCapability<T>() is null ? null : CreateWrapper(typeof(T));
                _capabilities[typeof(T)] = wrapper;
            }

            return (T?)wrapper;
        }
    }

    /// <inheritdoc/>
    public async ValueTask DisposeAsync()
    {
        await _gate.WaitAsync().ConfigureAwait(false);
        try
        {
            await DropAsync().ConfigureAwait(false);
        }
        finally
        {
            _gate.Release();
        }
    }

    /// <summary>
    /// Runs <paramref name="operation"/> on the connected adapter under the resilience rules.
    /// </summary>
    /// <param name="operationName">Named in errors, e.g. <c>acquire S21</c>.</param>
    /// <param name="idempotent">True when repeating the operation is harmless (settings, queries, sweeps); only then is it retried.</param>
    /// <param name="timeout">Time allowed for one attempt.</param>
    /// <param name="operation">The work, given the adapter and a token that fires on timeout or cancellation.</param>
    /// <param name="cancellationToken">The caller's cancellation; never retried.</param>
    /// <exception cref="InstrumentTimeoutException">An attempt ran out of time and no retry succeeded.</exception>
    /// <exception cref="InstrumentUnavailableException">The breaker is open.</exception>
    public async Task<T> ExecuteAsync<T>(string operationName, bool idempotent, TimeSpan timeout,
        Func<IInstrument, CancellationToken, Task<T>> operation, CancellationToken cancellationToken)
    {
        await _gate.WaitAsync(cancellationToken).ConfigureAwait(false);
        var context = ResilienceContextPool.Shared.Get(cancellationToken);
        context.Properties.Set(TimeoutKey, timeout);
        context.Properties.Set(IdempotentKey, idempotent);
        try
        {
            return await _pipeline.ExecuteAsync(
                async (ctx, state) =>
                {
                    var instrument = await EnsureConnectedAsync(ctx.CancellationToken).ConfigureAwait(false);
                    try
                    {
                        return await state(instrument, ctx.CancellationToken).ConfigureAwait(false);
                    }
                    catch (Exception ex) when (IsTransient(ex) || ex is OperationCanceledException)
                    {
                        // The session may be out of step; the next attempt starts from a fresh adapter.
                        await DropAsync().ConfigureAwait(false);
                        throw;
                    }
                },
                context,
                operation).ConfigureAwait(false);
        }
        catch (TimeoutRejectedException ex)
        {
            throw new InstrumentTimeoutException($"{operationName} did not finish within {timeout.TotalMilliseconds:0} ms", ex) { Instrument = Name };
        }
        catch (BrokenCircuitException ex)
        {
            var wait = ex.RetryAfter ?? _options.BreakDuration;
            throw new InstrumentUnavailableException(
                $"not asked to {operationName}: it failed repeatedly and is rested for {wait.TotalSeconds:0.#} s", wait, ex) { Instrument = Name };
        }
        catch (InstrumentException ex) when (ex.Instrument is null)
        {
            ex.NameInstrument(Name);
            throw;
        }
        finally
        {
            ResilienceContextPool.Shared.Return(context);
            _gate.Release();
        }
    }

    /// <summary>
    /// Registers an action that brings a fresh adapter back to the last settings; it runs after every
    /// reconnect, before the operation that needed the reconnect. A kind's resilient capability
    /// registers one when it is built (<see cref="InstrumentKind"/>).
    /// </summary>
    public void Remember(Func<IInstrument, CancellationToken, Task> restore)
    {
        ArgumentNullException.ThrowIfNull(restore);
        lock (_restorers)
        {
            _restorers.Add(restore);
        }
    }

    private async Task<IInstrument> EnsureConnectedAsync(CancellationToken cancellationToken)
    {
        if (_current is not null)
        {
            return _current;
        }

        var fresh = _factory();
        try
        {
            await fresh.ConnectAsync(cancellationToken).ConfigureAwait(false);
            List<Func<IInstrument, CancellationToken, Task>> restorers;
            lock (_restorers)
            {
                restorers = [.. _restorers];
            }

            foreach (var restore in restorers)
            {
                await restore(fresh, cancellationToken).ConfigureAwait(false);
            }
        }
        catch
        {
            await fresh.DisposeAsync().ConfigureAwait(false);
            throw;
        }

        _current = fresh;
        _lastConnected = fresh;
        ConnectionCount++;
        return fresh;
    }

    private async Task DropAsync()
    {
        var current = _current;
        _current = null;
        if (current is not null)
        {
            try
            {
                await current.DisposeAsync().ConfigureAwait(false);
            }
            catch (Exception ex) when (ex is InstrumentException or IOException or ObjectDisposedException)
            {
                // Closing a connection that has already failed may fail too; the fresh one matters.
            }
        }
    }

    private object CreateWrapper(Type capability)
    {
        var kind = _kinds.ForCapability(capability)
            ?? throw new NotSupportedException($"{Name}: no resilient wrapper for the capability {capability.Name}: no registered kind provides it.");
        return kind.ResilientCapability(this);
    }

    private static bool IsTransient(Exception? ex) =>
        ex is InstrumentException { IsTransient: true } and not InstrumentUnavailableException || ex is TimeoutRejectedException || ex is IOException;

    private static ResiliencePipeline BuildPipeline(InstrumentResilienceOptions options, TimeProvider timeProvider)
    {
        var builder = new ResiliencePipelineBuilder { TimeProvider = timeProvider };
        if (options.RetryAttempts > 0)
        {
            builder.AddRetry(new RetryStrategyOptions
            {
                ShouldHandle = args => ValueTask.FromResult(
                    args.Context.Properties.GetValue(IdempotentKey, false) && IsTransient(args.Outcome.Exception)),
                MaxRetryAttempts = options.RetryAttempts,
                Delay = options.RetryBaseDelay,
                BackoffType = DelayBackoffType.Exponential,
                UseJitter = false,
            });
        }

        builder.AddCircuitBreaker(new CircuitBreakerStrategyOptions
        {
            ShouldHandle = args => ValueTask.FromResult(IsTransient(args.Outcome.Exception)),
            FailureRatio = options.BreakerFailureRatio,
            MinimumThroughput = options.BreakerMinimumThroughput,
            SamplingDuration = options.BreakerSamplingDuration,
            BreakDuration = options.BreakDuration,
        });
        builder.AddTimeout(new TimeoutStrategyOptions
        {
            TimeoutGenerator = args => ValueTask.FromResult(args.Context.Properties.GetValue(TimeoutKey, options.OperationTimeout)),
        });
        return builder.Build();
    }
}
