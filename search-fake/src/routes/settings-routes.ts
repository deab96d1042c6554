import { ApiError } from '../api-error.js';
import { checkIndexUid } from '../engine.js';
import { defaultSettings, settingFromRoute, validateSetting, validateSettingsPatch, type SettingName } from '../index-settings.js';
import { accepted, ok, route, type Route, type RouteContext } from '../route-table.js';

function settingName(context: RouteContext): SettingName {
  const segment = context.params['name'] as string;
  const name = settingFromRoute(segment);
  if (name === null) throw new ApiError('route_not_found', `No setting route \`settings/${segment}\`.`);
  return name;
}

function updateOne(context: RouteContext) {
  const name = settingName(context);
  const value = context.body === undefined ? null : context.body;
  validateSetting(name, value);
  return accepted(context.engine.updateSettings(checkIndexUid(context.params['uid']), { [name]: value }));
}

export const settingsRoutes: Route[] = [
  route('GET', '/indexes/:uid/settings', 'settings.get', ({ engine, params }) => ok(engine.index(params['uid'] as string).settings)),
  route('PATCH', '/indexes/:uid/settings', 'settings.update', ({ engine, params, body }) =>
    accepted(engine.updateSettings(checkIndexUid(params['uid']), validateSettingsPatch(body)))),
  route('DELETE', '/indexes/:uid/settings', 'settings.update', ({ engine, params }) => {
    const reset = Object.fromEntries(Object.keys(defaultSettings()).map((name) => [name, null]));
    return accepted(engine.updateSettings(checkIndexUid(params['uid']), reset));
  }),
  route('GET', '/indexes/:uid/settings/:name', 'settings.get', (context) => {
    const name = settingName(context);
    return ok(context.engine.index(context.params['uid'] as string).settings[name]);
  }),
  // The SDK uses PUT for list settings and PATCH for object settings; both are taken for either.
  route('PUT', '/indexes/:uid/settings/:name', 'settings.update', updateOne),
  route('PATCH', '/indexes/:uid/settings/:name', 'settings.update', updateOne),
  route('DELETE', '/indexes/:uid/settings/:name', 'settings.update', (context) =>
    accepted(context.engine.updateSettings(checkIndexUid(context.params['uid']), { [settingName(context)]: null }))),
];
