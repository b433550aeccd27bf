import { answer, receive, type LiveCheckRequest, type LiveCheckState } from './live-check-request';

// The live checks of a drag, off the page's main thread. Requests are answered in order, but one that a
// newer request has already overtaken is skipped: its answer would be stale before it arrived.
let state: LiveCheckState = {};
let latest: LiveCheckRequest | undefined;

addEventListener('message', (event: MessageEvent<LiveCheckRequest>) => {
  state = receive(state, event.data);
  const waiting = latest !== undefined;
  latest = event.data;
  // Behind the messages already queued, so that a burst of moves is checked once, at its last.
  if (!waiting) setTimeout(checkLatest);
});

function checkLatest(): void {
  const request = latest;
  latest = undefined;
  if (request) postMessage(answer(state, request));
}
