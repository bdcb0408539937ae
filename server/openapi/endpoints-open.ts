import * as cableRuns from '@/shared/api/cable-runs';
import * as devices from '@/shared/api/devices';
import * as email from '@/shared/api/email';
import * as health from '@/shared/api/health';
import * as hookups from '@/shared/api/hookups';
import * as projections from '@/shared/api/projections';
import * as readings from '@/shared/api/readings';
import * as solar from '@/shared/api/solar';
import { type Endpoint, json, OPEN, page } from './registry';

/** The routes anyone may call: the model, its calculators, the catalogue, health and unsubscribe. */
export const OPEN_ENDPOINTS: Endpoint[] = [
  {
    method: 'get',
    path: '/api/health',
    tag: 'health',
    summary: 'Whether the server and its database answer.',
    who: 'anyone (not rate-limited)',
    responses: { 200: json('Up, the database connected.', health.healthSchema), 503: json('The database cannot be reached (`status: "degraded"`).', health.healthSchema) },
  },
  {
    method: 'get',
    path: '/api/openapi.json',
    tag: 'health',
    summary: 'This API described as OpenAPI 3.1 (made from shared/api).',
    who: OPEN,
    responses: { 200: page('The OpenAPI document.', 'application/json') },
  },
  {
    method: 'post',
    path: '/api/projections',
    tag: 'model',
    summary: 'Runs the energy model on a rig (docs/model.md): days to the cut-off parked and on the routine, the margin, the chart, Fixes.',
    who: OPEN,
    body: projections.projectionInputSchema,
    responses: { 200: json('The projection.', projections.projectionSchema) },
  },
  {
    method: 'post',
    path: '/api/projections/compare',
    tag: 'model',
    summary: 'Try a load: the rig without and with candidate loads (and its own loads marked candidate).',
    who: OPEN,
    body: projections.compareInputSchema,
    responses: { 200: json('Both sides and the difference (with − without).', projections.comparisonSchema) },
  },
  {
    method: 'post',
    path: '/api/solar/daily',
    tag: 'model',
    summary: 'The sun of one day at a place (FAO-56 eqs. 21 to 25, 34 and 37) and its peak sun hours under the chosen sky.',
    who: OPEN,
    body: solar.solarDailyInputSchema,
    responses: { 200: json('MJ m⁻² day⁻¹ and hours, two decimals; polar night answers zeros.', solar.dailySunSchema) },
  },
  {
    method: 'post',
    path: '/api/cable-runs/size',
    tag: 'model',
    summary: 'Sizes one cable run (length one way): conductor, drop, ampacity and protection.',
    who: OPEN,
    body: cableRuns.cableRunSizeSchema,
    responses: { 200: json('The run sized, with its cautions.', cableRuns.cableRunSizedSchema) },
    errors: { 422: '`no_conductor`: no conductor up to 4/0 AWG / 95 mm² carries the current within the limits.' },
  },
  {
    method: 'post',
    path: '/api/hookups',
    tag: 'model',
    summary: 'The inverter’s hook-up planned from a power system, part by part.',
    who: OPEN,
    body: hookups.hookupInputSchema,
    responses: { 200: json('The plan, with its warnings and cautions.', hookups.hookupAnswerSchema) },
  },
  {
    method: 'get',
    path: '/api/devices',
    tag: 'model',
    summary: 'The device catalogue (no brands), searched: `q` matches every word in the name, category or note.',
    who: OPEN,
    query: devices.deviceQuerySchema,
    responses: { 200: json('Matching devices, each with a load as the load schema takes it.', devices.deviceListSchema) },
  },
  {
    method: 'post',
    path: '/api/readings/analyze',
    tag: 'readings',
    summary: 'The drain over the quiet hours of a record of readings (docs/readings.md).',
    who: OPEN,
    body: readings.analyzeSchema,
    responses: { 200: json('The analysis.', readings.analysisAnswerSchema) },
  },
  {
    method: 'get',
    path: '/api/email/unsubscribe',
    tag: 'e-mail',
    summary: 'The unsubscribe link in each e-mail: turns that kind of e-mail off.',
    who: 'anyone holding the signed token (no sign-in)',
    query: email.unsubscribeQuerySchema,
    responses: { 200: page('A small page saying which e-mails are off.', 'text/html') },
    errors: { 404: 'No such account.', 410: 'The link has expired.' },
  },
  {
    method: 'post',
    path: '/api/email/unsubscribe',
    tag: 'e-mail',
    summary: 'RFC 8058 one-click unsubscribe, sent by mail programs to the List-Unsubscribe address.',
    who: 'anyone holding the signed token (no sign-in)',
    query: email.unsubscribeQuerySchema,
    responses: { 200: json('Which list is off.', email.unsubscribedSchema) },
    errors: { 404: 'No such account.', 410: 'The link has expired.' },
  },
];
