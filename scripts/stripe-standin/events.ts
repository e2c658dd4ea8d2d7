/** The Stripe stand-in: events (/v1/events). */
import { noSuch } from "./errors";
import { type FormObject, str, stringList } from "./form";
import { type EventObject } from "./objects";
import { clone, type ListResult, type StandinStore } from "./store";

export function retrieveEvent(store: StandinStore, id: string): EventObject {
  const event = store.events.find((e) => e.id === id);
  if (!event) throw noSuch("event", id);
  return clone(event);
}

export function listEvents(store: StandinStore, p: FormObject): ListResult<EventObject> {
  const type = str(p, "type");
  const types = stringList(p, "types");
  const matches = (t: string) => {
    const one = (pattern: string) => (pattern.endsWith(".*") ? t.startsWith(pattern.slice(0, -1)) : t === pattern);
    return (!type || one(type)) && (!types || types.some(one));
  };
  const newestFirst = [...store.events].reverse().filter((e) => matches(e.type));
  return store.page(newestFirst, p, "/v1/events");
}
