import {
  gaugeStudyDetailSchema,
  gaugeStudySummarySchema,
  gaugeStudyTurnSchema,
  waitingGaugeStudySchema,
  type CreateGaugeStudyInput,
  type GaugeCorrectionInput,
  type GaugeMeasurementInput,
  type GaugeStudyDetail,
  type GaugeStudyTurn,
} from '@evenset/contracts';
import { z } from 'zod';
import { apiWrite } from '../../lib/api-client';
import { apiKey, useApi, useRevalidateUnder } from '../../lib/swr';

export const GAUGE_STUDIES_PATH = '/gauge-studies';
const studyPath = (id: string) => `${GAUGE_STUDIES_PATH}/${encodeURIComponent(id)}`;

const listSchema = z.object({ items: z.array(gaugeStudySummarySchema) });
const waitingSchema = z.object({ items: z.array(waitingGaugeStudySchema) });
const inspectorsSchema = z.object({ items: z.array(z.object({ id: z.string(), displayName: z.string() })) });

export const useGaugeStudies = () => useApi(apiKey(GAUGE_STUDIES_PATH, listSchema));
export const useGaugeStudy = (id: string) => useApi(apiKey(studyPath(id), gaugeStudyDetailSchema));
export const useStudyInspectors = () => useApi(apiKey(`${GAUGE_STUDIES_PATH}/inspectors`, inspectorsSchema));
export const useWaitingStudies = () => useApi(apiKey(`${GAUGE_STUDIES_PATH}/waiting`, waitingSchema));
export const useStudyTurn = (id: string) => useApi(apiKey(`${studyPath(id)}/next`, gaugeStudyTurnSchema));
export const useRevalidateGaugeStudies = () => useRevalidateUnder(GAUGE_STUDIES_PATH);

export function createGaugeStudy(input: CreateGaugeStudyInput): Promise<GaugeStudyDetail> {
  return apiWrite('POST', GAUGE_STUDIES_PATH, input, gaugeStudyDetailSchema);
}

export function saveGaugeMeasurement(id: string, input: GaugeMeasurementInput): Promise<GaugeStudyTurn> {
  return apiWrite('POST', `${studyPath(id)}/measurements`, input, gaugeStudyTurnSchema);
}

export function correctGaugeMeasurement(
  id: string,
  measurementId: string,
  input: GaugeCorrectionInput,
): Promise<GaugeStudyTurn> {
  return apiWrite(
    'POST',
    `${studyPath(id)}/measurements/${encodeURIComponent(measurementId)}/corrections`,
    input,
    gaugeStudyTurnSchema,
  );
}
